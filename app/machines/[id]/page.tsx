import type { Metadata } from "next";
import Link from "next/link";
import { MachinePartsTable } from "@/components/machines/machine-parts-table";
import { getMachine, type MachineDetail } from "@/lib/catalogue/browse";
import { loadByIdOr404 } from "@/lib/http/load-or-404";

const load = (idText: string): Promise<MachineDetail> => loadByIdOr404(idText, getMachine);

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
