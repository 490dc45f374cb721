"use client";

import Link from "next/link";
import { AddToList } from "@/components/lists/add-to-list";
import { proposalHref, type ProposalPrefill } from "@/lib/proposals/prefill-link";
import type { MeasuredKind } from "@/lib/lists/standard-item";

/**
 * From a calculator's answer to the job: put the standard part on a job list by its designation and sizes, or
 * propose it as the cross for a factory part, with the form filled in.
 */
export function ResultActions({
  kind,
  designation,
  note,
  measurements,
  template,
}: {
  kind: MeasuredKind;
  designation: string;
  note?: string;
  measurements: ProposalPrefill["measurements"];
  /** A gasket's template query, kept with the line and the proposal. */
  template?: string;
}) {
  return (
    <div className="flex flex-wrap items-start gap-x-6 gap-y-3 border-t border-rule pt-3" data-testid="result-actions">
      <AddToList item={{ standard: { kind, designation, note, template } }} number={designation} />
      <Link href={proposalHref({ kind, designation, measurements, template })} className="font-bold">
        Propose as a cross for a part…
      </Link>
    </div>
  );
}
