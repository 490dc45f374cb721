import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { MachinePartsTable } from "@/components/machines/machine-parts-table";
import { getMachine, type MachineDetail } from "@/lib/catalogue/browse";
import { AppError } from "@/lib/errors";
import { partIdParam } from "@/lib/validation/catalogue";

async function load(idText: string): Promise<MachineDetail> {
  const parsed = partIdParam.safeParse({ id: idText });
  if (!parsed.success) notFound();
  try {
    return await getMachine(parsed.data.id);
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}

export async function generateMetadata({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> {
  const machine = await load((await params).id);
  return { title: `${machine.maker} ${machine.model}` };
}

export default async function MachinePage({ params }: { params: Promise<{ id: string }> }) {
  const machine = await load((await params).id);
  return (
    <div className="space-y-6">
      <div className="space-y-1">
        <Link href="/machines">← All machines</Link>
        <h1 className="text-3xl">
          {machine.maker} {machine.model}
        </h1>
        <p className="text-ink-soft">
          {machine.kind} · built {machine.years}
          {machine.serialNote && <> · {machine.serialNote}</>}
        </p>
      </div>
      <ul className="flex flex-wrap gap-2 text-sm" aria-label="Assemblies">
        {machine.assemblies.map((a) => (
          <li key={a.name} className="rounded-full border border-rule-strong bg-ground-raised px-3 py-1">
            {a.name} <span className="num text-ink-soft">{a.count}</span>
          </li>
        ))}
      </ul>
      <MachinePartsTable rows={machine.parts} />
    </div>
  );
}
