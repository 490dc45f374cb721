"use client";

import { useState } from "react";
import { CandidatesTable } from "@/components/measure/candidates-table";
import { CatalogueMatches } from "@/components/measure/catalogue-matches";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { SealDrawing, type SealDimension } from "@/components/measure/seal-drawing";
import { SizeField } from "@/components/measure/size-field";
import { MeasurePanel } from "@/components/measure/measure-panel";
import { WarningList } from "@/components/measure/warning-list";
import { Notice } from "@/components/ui/notice";
import { usePressFit, useSealMatch } from "@/lib/hooks/use-calculators";
import { useMeasuredSizes } from "@/lib/hooks/use-measured-sizes";
import type { PressFit, SealCandidate, SealOrder, ShaftCheck } from "@/lib/standards/seals";
import type { SizedPart } from "@/lib/catalogue/find-by-size";
import { measuredValues, showLength } from "@/lib/standards/units";

interface SealMatch {
  order: SealOrder;
  candidates: SealCandidate[];
  warnings: string[];
  remedies: string[];
  shaft: ShaftCheck;
  catalogueParts: SizedPart[];
}

const selectClass = "min-h-12 w-full rounded-md border-2 border-rule-strong bg-ground-raised px-3 text-lg";

export function SealCalculator() {
  const { unit, changeUnit, sizes, set, settled } = useMeasuredSizes(
    ["shaft", "bore", "width", "sealOd"] as const,
    "seal",
  );
  const [grooved, setGrooved] = useState(false);
  const [spring, setSpring] = useState("1");
  const [dustLip, setDustLip] = useState(false);
  const [outside, setOutside] = useState<"metal" | "rubber">("metal");
  const [active, setActive] = useState<SealDimension>(null);

  const match = useSealMatch<SealMatch>({
    shaft: settled.shaft,
    bore: settled.bore,
    width: settled.width,
    unit,
    grooved,
    spring,
    dustLip,
    outside,
  });
  const fit = usePressFit<PressFit>({ bore: settled.bore, sealOd: settled.sealOd, unit, outside });

  return (
    <div className="space-y-8">
      <MeasurePanel
        unit={unit}
        onUnit={changeUnit}
        error={unplacedError(match.error, ["shaft", "bore", "width"])}
        fields={
          <>
            <SizeField
              id="shaft"
              label="Shaft"
              hint="Measure the shaft, not the old lip."
              value={sizes.shaft}
              onChange={set("shaft")}
              onFocus={() => setActive("shaft")}
              error={errorFor(match.error, "shaft")}
              unit={unit}
            />
            <SizeField
              id="bore"
              label="Housing bore"
              value={sizes.bore}
              onChange={set("bore")}
              onFocus={() => setActive("bore")}
              error={errorFor(match.error, "bore") ?? errorFor(fit.error, "bore")}
              unit={unit}
            />
            <SizeField
              id="width"
              label="Width"
              hint="Optional."
              value={sizes.width}
              onChange={set("width")}
              onFocus={() => setActive("width")}
              error={errorFor(match.error, "width")}
              unit={unit}
            />
          </>
        }
        extra={
          <fieldset className="grid gap-4 rounded-lg border border-rule p-4 sm:grid-cols-2">
            <legend className="px-1 font-bold">What the old seal was like</legend>
            <label className="flex min-h-12 items-center gap-3">
              <input
                type="checkbox"
                checked={grooved}
                onChange={(e) => setGrooved(e.target.checked)}
                className="h-6 w-6 accent-brass"
              />
              The old lip has worn a groove in the shaft
            </label>
            <label className="flex min-h-12 items-center gap-3">
              <input
                type="checkbox"
                checked={dustLip}
                onChange={(e) => setDustLip(e.target.checked)}
                className="h-6 w-6 accent-brass"
              />
              It had a second, dust lip
            </label>
            <div className="space-y-1">
              <label htmlFor="seal-lip" className="block font-bold">
                Lip
              </label>
              <select id="seal-lip" value={spring} onChange={(e) => setSpring(e.target.value)} className={selectClass}>
                <option value="1">Spring-loaded (a garter spring behind the lip)</option>
                <option value="0">Plain, no spring (or leather)</option>
              </select>
            </div>
            <div className="space-y-1">
              <label htmlFor="seal-outside" className="block font-bold">
                Outside
              </label>
              <select
                id="seal-outside"
                value={outside}
                onChange={(e) => setOutside(e.target.value as "metal" | "rubber")}
                className={selectClass}
              >
                <option value="metal">Bare metal case</option>
                <option value="rubber">Rubber-covered</option>
              </select>
            </div>
          </fieldset>
        }
        drawing={<SealDrawing active={active} />}
        caption="The spring side of the lip faces the oil. Measure the shaft where the new lip will run."
      />
      <section aria-live="polite" aria-busy={match.isLoading} className="space-y-3" aria-label="Matching seals">
        {match.data && (
          <OrderCard
            title="The seal to ask for"
            label={match.data.order.label}
            details={
              <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[14rem_1fr]">
                <dt className="font-bold">New seal&apos;s outside diameter</dt>
                <dd className="num">
                  {showLength(match.data.order.sealOd.min, match.data.order.unit)} to{" "}
                  {showLength(match.data.order.sealOd.max, match.data.order.unit)}
                </dd>
                <dt className="font-bold">Ask for</dt>
                <dd>{match.data.order.askFor}</dd>
              </dl>
            }
            notes={match.data.order.notes}
            source={match.data.order.source}
          >
            <ResultActions
              kind="lip_seal"
              designation={match.data.order.label}
              note={
                `seal OD ` +
                `${showLength(match.data.order.sealOd.min, match.data.order.unit)} to ` +
                `${showLength(match.data.order.sealOd.max, match.data.order.unit)}; ` +
                `${match.data.order.askFor}`
              }
              measurements={measuredValues(
                [
                  ["inner", settled.shaft],
                  ["outer", settled.bore],
                  ["width", settled.width],
                ],
                unit,
              )}
            />
          </OrderCard>
        )}
        <WarningList warnings={match.data?.warnings} />
        {match.data && match.data.remedies.length > 0 && (
          <div className="rounded-lg border border-rule-strong bg-ground-raised p-4">
            <h2 className="mb-2 text-lg">What to do about the groove</h2>
            <ul className="list-disc space-y-1 pl-5">
              {match.data.remedies.map((r) => (
                <li key={r}>{r}</li>
              ))}
            </ul>
          </div>
        )}
        {match.data && <Notice>{match.data.shaft.message}</Notice>}
        {match.data && (
          <CandidatesTable
            title="Standard sizes nearby"
            caption="Tabulated lip seal sizes near the measured ones"
            unit={unit}
            emptyText="No tabulated size is near; order by the sizes above."
            rows={match.data.candidates.map((c) => ({
              key: c.size,
              name: c.size,
              detail: `${c.system === "inch" ? "inch" : "metric, ISO 6194-1"} · ask for: ${c.orderAs}`,
              score: c.score,
              deviations: c.deviations,
              warnings: c.warnings,
            }))}
          />
        )}
        <CatalogueMatches parts={match.data?.catalogueParts} unit={unit} />
        {!match.data && !match.error && (
          <p className="text-ink-soft">
            Enter the shaft and the housing bore; the matching standard seals appear here.
          </p>
        )}
      </section>

      <section aria-labelledby="fit-heading" className="space-y-3 rounded-lg border border-rule bg-ground-sunk p-4">
        <h2 id="fit-heading" className="text-xl">
          Will it stay in the housing?
        </h2>
        <p className="text-ink-soft">
          Give the new seal&apos;s outside diameter to check its press fit in the bore above.
        </p>
        <div className="max-w-xs">
          <SizeField
            id="sealOd"
            label="Seal outside diameter"
            value={sizes.sealOd}
            onChange={set("sealOd")}
            onFocus={() => setActive("sealOd")}
            error={errorFor(fit.error, "sealOd")}
            unit={unit}
          />
        </div>
        {fit.data && (
          <div aria-live="polite">
            <Notice tone={fit.data.verdict === "ok" ? "success" : "caution"}>
              <strong className="mr-1 uppercase">
                {fit.data.verdict === "ok" ? "Fit OK" : fit.data.verdict === "loose" ? "Loose" : "Tight"}.
              </strong>
              {fit.data.message}
              <span className="mt-1 block text-sm text-ink-soft">Source: {fit.data.source}.</span>
            </Notice>
          </div>
        )}
      </section>
    </div>
  );
}
