import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ProposalForm } from "@/components/proposals/proposal-form";
import { Notice } from "@/components/ui/notice";
import { requirePagePermission } from "@/lib/auth/session";
import { loadByIdOr404 } from "@/lib/http/load-or-404";
import { standardSizes } from "@/lib/catalogue/sizes";
import { loadFormChoices } from "@/lib/proposals/form-choices";
import { getProposalDetail } from "@/lib/proposals/views";

export const metadata: Metadata = { title: "Change your proposal" };

export default async function EditProposalPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: idText } = await params;
  const user = await requirePagePermission("proposals:create", `/proposals/${idText}/edit`);
  const detail = await loadByIdOr404(idText, (id) => getProposalDetail(id, user));
  if (!detail.mine) notFound();

  if (detail.status !== "changes_requested") {
    return (
      <div className="max-w-2xl space-y-4">
        <h1 className="text-3xl">Change your proposal</h1>
        <Notice>
          {detail.status === "pending"
            ? "This proposal is waiting for review. It can be changed only when a moderator sends it back."
            : "This proposal has been decided and can no longer be changed."}
        </Notice>
        <Link href="/proposals">Back to your proposals</Link>
      </div>
    );
  }

  const choices = await loadFormChoices();
  const p = detail.part;
  const s = detail.standardPart;
  return (
    <div className="max-w-3xl space-y-6">
      <header className="space-y-2">
        <h1 className="text-3xl">Change your proposal</h1>
        <Notice tone="caution">
          <p className="font-bold">The moderator wrote:</p>
          <p>{detail.moderatorMessage}</p>
        </Notice>
      </header>
      <ProposalForm
        editId={detail.id}
        choices={choices}
        defaults={{
          original: p.isNew
            ? {
                mode: "new",
                makerId: p.makerId,
                number: p.number,
                description: p.description,
                category: p.category,
                machineId: p.machineId,
                assemblyId: p.assemblyId,
              }
            : { mode: "existing", partId: p.id },
          standard: s.isNew
            ? {
                mode: "new",
                kind: s.kind,
                designation: s.designation,
                innerMm: s.innerMm,
                outerMm: s.outerMm,
                widthMm: s.widthMm,
                lengthMm: s.lengthMm,
              }
            : { mode: "existing", standardPartId: s.id },
          fit: detail.fit,
          measurements: detail.measurements,
          notes: detail.notes ?? "",
          photoIds: detail.photoList.map((ph) => ph.id),
        }}
        pickedPart={
          p.isNew ? null : { id: p.id!, number: p.number, maker: p.maker, description: p.description, dims: p.dims }
        }
        pickedStandard={
          s.isNew
            ? null
            : {
                id: s.id!,
                designation: s.designation,
                sizes: standardSizes(s),
                kind: s.kind,
                dims: { innerMm: s.innerMm, outerMm: s.outerMm, widthMm: s.widthMm, lengthMm: s.lengthMm },
              }
        }
        photos={detail.photoList.map((ph) => ({
          key: `stored-${ph.id}`,
          name: ph.fileName ?? `Photo ${ph.id}`,
          preview: ph.url,
          status: "done",
          photoId: ph.id,
        }))}
      />
    </div>
  );
}
