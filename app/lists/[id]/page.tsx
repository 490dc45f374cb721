import type { Metadata } from "next";
import Link from "next/link";
import { ListDetailsForm } from "@/components/lists/list-details-form";
import { ListEditor } from "@/components/lists/list-editor";
import { machineChoices } from "@/lib/catalogue/browse";
import { Cautions } from "@/components/safety/cautions";
import { requirePagePermission } from "@/lib/auth/session";
import { loadByIdOr404 } from "@/lib/http/load-or-404";
import { getList } from "@/lib/lists/lists";

export const metadata: Metadata = { title: "Job list" };

export default async function ListPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: idText } = await params;
  const user = await requirePagePermission("lists:manage", `/lists/${idText}`);
  const view = await loadByIdOr404(idText, (id) => getList({ userId: user.id }, id));
  const machines = await machineChoices();
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <p>
          <Link href="/lists">← Your job lists</Link>
        </p>
        <h1 className="text-3xl">{view.title}</h1>
        {view.machine && (
          <p className="text-ink-soft">
            For the{" "}
            <Link href={`/machines/${view.machine.id}`}>
              {view.machine.maker} {view.machine.model}
            </Link>
            {view.machineSerial && <span className="num">, serial {view.machineSerial}</span>}
          </p>
        )}
        {view.notes && <p className="whitespace-pre-line">{view.notes}</p>}
      </header>
      <ListDetailsForm
        id={view.id}
        title={view.title}
        machineId={view.machine?.id ?? null}
        machineSerial={view.machineSerial}
        notes={view.notes}
        machines={machines}
      />
      <ListEditor initial={view} />
      {view.cautions.length > 0 && <Cautions kinds={view.cautions} />}
    </div>
  );
}
