import type { StandardKind } from "@/lib/catalogue/kinds";
import type { Measurement } from "@/lib/proposals/kinds";

// Kept apart from the reading of such a link (prefill.ts), so a calculator's page links to the proposal form without
// carrying the form's checks.

/** What a calculator hands the proposal form: the standard part it worked out and what was measured. */
export interface ProposalPrefill {
  kind: StandardKind;
  designation: string;
  measurements: Measurement[];
  /** A gasket's template query. */
  template?: string;
}

/** The link from a calculator's result to the proposal form, filled in. */
export function proposalHref(prefill: ProposalPrefill): string {
  const query = new URLSearchParams({ kind: prefill.kind, designation: prefill.designation });
  const m = prefill.measurements
    .filter((x) => Number.isFinite(x.value) && x.value > 0)
    .map((x) => `${x.dimension}:${x.value}:${x.unit}`)
    .join(",");
  if (m) query.set("m", m);
  if (prefill.template) query.set("template", prefill.template);
  return `/propose?${query}`;
}
