"use client";

import { useState } from "react";
import { BearingDrawing, type BearingDimension } from "@/components/measure/bearing-drawing";
import { CandidatesTable } from "@/components/measure/candidates-table";
import { CatalogueMatches } from "@/components/measure/catalogue-matches";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { SizeField } from "@/components/measure/size-field";
import { MeasurePanel } from "@/components/measure/measure-panel";
import { WarningList } from "@/components/measure/warning-list";
import { useDebounced } from "@/lib/hooks/use-api";
import { useBearingDecode, useBearingMatch } from "@/lib/hooks/use-calculators";
import type { DecodedBearing } from "@/lib/standards/bearings";
import { useMeasuredSizes } from "@/lib/hooks/use-measured-sizes";
import { measuredValues, showLength } from "@/lib/standards/units";

// A bearing's metric size said in inches as a person would read it with a micrometer: to the thousandth.
const inches = (mm: number) => showLength(mm / 25.4, "in").replace(" in", "");

function DecodeCard({ decoded }: { decoded: DecodedBearing }) {
  const rows: Array<[string, string]> = [
    ["Bore", `${decoded.boreMm} mm (${inches(decoded.boreMm)} in)`],
    ["Outside diameter", `${decoded.outsideDiameterMm} mm (${inches(decoded.outsideDiameterMm)} in)`],
    ["Width", `${decoded.widthMm} mm (${inches(decoded.widthMm)} in)`],
    ["Closures", decoded.closures.text],
    ["Snap ring", decoded.snapRing.text],
    ["Internal clearance", decoded.clearance.text],
  ];
  return (
    <div className="space-y-3 rounded-lg border-2 border-ink/80 bg-ground-raised p-4" data-testid="bearing-decoded">
      <p>
        <span className="num text-2xl font-bold">{decoded.designation}</span>
        <span className="ml-2 text-ink-soft">{decoded.seriesName}</span>
      </p>
      <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[12rem_1fr]">
        {rows.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="font-bold">{term}</dt>
            <dd className={term === "Bore" || term === "Outside diameter" || term === "Width" ? "num" : ""}>{value}</dd>
          </div>
        ))}
      </dl>
      {decoded.notes.length > 0 && (
        <ul className="space-y-1 text-sm text-ink-soft">
          {decoded.notes.map((n) => (
            <li key={n} className="border-l-2 border-brass pl-2">
              {n}
            </li>
          ))}
        </ul>
      )}
      <ResultActions kind="bearing" designation={decoded.designation} measurements={[]} />
    </div>
  );
}

export function BearingCalculator() {
  const [designation, setDesignation] = useState("");
  const { unit, changeUnit, sizes, set, settled } = useMeasuredSizes(
    ["bore", "od", "width", "tolerance"] as const,
    "bearing",
  );
  const [active, setActive] = useState<BearingDimension>(null);
  const settledDesignation = useDebounced(designation);

  const decode = useBearingDecode(settledDesignation);
  const match = useBearingMatch({ ...settled, unit });

  return (
    <div className="space-y-10">
      <section aria-labelledby="read-heading" className="space-y-3">
        <h2 id="read-heading" className="text-2xl">
          Read the number on the bearing
        </h2>
        <SizeField
          id="designation"
          label="Bearing number as stamped on its side"
          hint="For example 6205-2RS, 6305 ZZ C3, 62/22, R8, or an older 206."
          value={designation}
          onChange={setDesignation}
          error={errorFor(decode.error, "designation")}
          placeholder="6205-2RS"
        />
        {decode.data && !decode.error && <DecodeCard decoded={decode.data} />}
      </section>

      <section aria-labelledby="measure-heading" className="space-y-4">
        <h2 id="measure-heading" className="text-2xl">
          No number? Measure it
        </h2>
        <MeasurePanel
          unit={unit}
          onUnit={changeUnit}
          columns="sm:grid-cols-2"
          error={unplacedError(match.error, ["bore", "od", "width", "tolerance"])}
          fields={
            <>
              <SizeField
                id="bore"
                label="Bore (d)"
                hint="Inside diameter of the inner ring."
                value={sizes.bore}
                onChange={set("bore")}
                onFocus={() => setActive("bore")}
                error={errorFor(match.error, "bore")}
                unit={unit}
              />
              <SizeField
                id="od"
                label="Outside diameter (D)"
                value={sizes.od}
                onChange={set("od")}
                onFocus={() => setActive("od")}
                error={errorFor(match.error, "od")}
                unit={unit}
              />
              <SizeField
                id="width"
                label="Width (B)"
                hint="Optional, but it tells series apart."
                value={sizes.width}
                onChange={set("width")}
                onFocus={() => setActive("width")}
                error={errorFor(match.error, "width")}
                unit={unit}
              />
              <SizeField
                id="tolerance"
                label="Tolerance"
                hint={`How far off a reading may be. Default ${unit === "in" ? "0.004 in" : "0.1 mm"}.`}
                value={sizes.tolerance}
                onChange={set("tolerance")}
                onFocus={() => setActive(null)}
                error={errorFor(match.error, "tolerance")}
                unit={unit}
              />
            </>
          }
          drawing={<BearingDrawing active={active} />}
          caption={
            "Measure each diameter at two or three places round it. A bearing that spun on its shaft reads large " +
            "in the bore, one that spun in its housing reads small on the OD; the matching allows for that."
          }
        />
        <div aria-live="polite" aria-busy={match.isLoading} className="space-y-3">
          {match.data && match.data.candidates[0] && (
            <OrderCard
              title={
                match.data.candidates[0].score >= 0.7
                  ? "The bearing to ask for"
                  : "The nearest standard bearing (a poor match: measure again)"
              }
              label={match.data.candidates[0].designation}
              notes={[match.data.candidates[0].explanation, ...match.data.candidates[0].warnings]}
              source={
                match.data.candidates[0].system === "inch"
                  ? "ABMA inch radial ball bearing series (R sizes)"
                  : "ISO 15:2017, boundary dimensions of deep groove ball bearings"
              }
            >
              <ResultActions
                kind="bearing"
                designation={match.data.candidates[0].designation}
                measurements={measuredValues(
                  [
                    ["inner", settled.bore],
                    ["outer", settled.od],
                    ["width", settled.width],
                  ],
                  unit,
                )}
              />
            </OrderCard>
          )}
          <WarningList warnings={match.data?.warnings} />
          {match.data && (
            <CandidatesTable
              title="All the standard bearings near these sizes"
              caption="Standard bearings that match the measured sizes"
              unit={unit}
              emptyText="No standard deep groove ball bearing is near these sizes."
              rows={match.data.candidates.map((c) => ({
                key: c.designation,
                name: c.designation,
                detail: c.system === "inch" ? "inch R series" : `series ${c.series}`,
                score: c.score,
                deviations: c.deviations,
                warnings: c.warnings,
              }))}
            />
          )}
          <CatalogueMatches parts={match.data?.catalogueParts} unit={unit} />
          {!match.data && !match.error && (
            <p className="text-ink-soft">
              Enter at least the bore and the outside diameter; the matching standard bearings appear here.
            </p>
          )}
        </div>
      </section>
    </div>
  );
}
