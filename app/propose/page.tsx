import type { Metadata } from "next";
import Link from "next/link";
import { ProposalForm } from "@/components/proposals/proposal-form";
import { Cautions } from "@/components/safety/cautions";
import { requirePagePermission } from "@/lib/auth/session";
import { loadFormChoices, pickedPartFor } from "@/lib/proposals/form-choices";
import { readProposalPrefill } from "@/lib/proposals/prefill";

export const metadata: Metadata = { title: "Propose a cross" };

export default async function ProposePage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const params = await searchParams;
  const partParam = typeof params.part === "string" ? params.part : undefined;
  // Signing in comes back to the same form, filled in as the calculator left it.
  const back = new URLSearchParams(Object.entries(params).flatMap(([k, v]) => (typeof v === "string" ? [[k, v]] : [])));
  await requirePagePermission("proposals:create", `/propose${back.size > 0 ? `?${back}` : ""}`);
  const prefill = readProposalPrefill(params);
  const [choices, part] = await Promise.all([loadFormChoices(), pickedPartFor(partParam)]);

  return (
    <div className="grid gap-8 lg:grid-cols-[1fr_20rem]">
      <div className="space-y-6">
        <header className="space-y-2">
          <h1 className="text-3xl">Propose a cross</h1>
          <p className="max-w-2xl text-lg">
            Tell other restorers which standard part you fitted in place of an obsolete one. A moderator checks every
            proposal before it reaches the catalogue, because a wrong cross can cost someone a rebuild.
          </p>
          <p className="text-ink-soft">
            Already sent some? <Link href="/proposals">See your proposals</Link>.
          </p>
        </header>
        <ProposalForm
          choices={choices}
          defaults={{
            original: part ? { mode: "existing", partId: part.id } : { mode: "existing", partId: null },
            standard: prefill?.standard ?? { mode: "existing", standardPartId: null },
            fit: undefined as never,
            measurements: prefill?.measurements ?? [],
            notes: "",
            photoIds: [],
          }}
          pickedPart={part}
          pickedStandard={null}
          photos={[]}
        />
      </div>
      <div className="space-y-4">
        <Cautions kinds={["bearings", "seals", "belts"]} />
      </div>
    </div>
  );
}
