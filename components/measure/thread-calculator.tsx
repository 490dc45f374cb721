"use client";

import { useState } from "react";
import { CandidatesTable } from "@/components/measure/candidates-table";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { MeasurePanel } from "@/components/measure/measure-panel";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { SizeField } from "@/components/measure/size-field";
import { ThreadDrawing, type ThreadDimension } from "@/components/measure/small-part-drawings";
import { WarningList } from "@/components/measure/warning-list";
import { Field } from "@/components/ui/field";
import { useDebounced } from "@/lib/hooks/use-api";
import { useThreadIdentify } from "@/lib/hooks/use-calculators";
import { useMeasuredSizes } from "@/lib/hooks/use-measured-sizes";
import { GREASE_FITTINGS } from "@/lib/standards/threads";
import { measuredValues } from "@/lib/standards/units";

const selectClass = "min-h-12 w-full rounded-md border-2 border-rule-strong bg-ground-raised px-3 text-lg";

/** A thread from calipers and a thread gauge: inch, British or metric, bolt, pipe or spark plug. */
export function ThreadCalculator() {
  const { unit, changeUnit, sizes, set, settled } = useMeasuredSizes(["diameter"] as const, "thread");
  // The gauge reading is a count or a pitch, not a length: the unit switch leaves it as it is.
  const [count, setCount] = useState("");
  const settledCount = useDebounced(count);
  const [gauge, setGauge] = useState<"tpi" | "pitch">("tpi");
  const [active, setActive] = useState<ThreadDimension>(null);
  const params = { diameter: settled.diameter, unit, [gauge]: settledCount };
  const found = useThreadIdentify(params, ["diameter", gauge]);
  const best = found.data?.candidates[0];
  const bestThread = best?.designation.replace(/ \(.*\)$/, "");

  return (
    <div className="space-y-8">
      <MeasurePanel
        unit={unit}
        onUnit={changeUnit}
        error={unplacedError(found.error, ["diameter", "tpi", "pitch"])}
        fields={
          <>
            <SizeField
              id="diameter"
              label="Diameter over the crests"
              value={sizes.diameter}
              onChange={set("diameter")}
              onFocus={() => setActive("diameter")}
              error={errorFor(found.error, "diameter")}
              unit={unit}
            />
            <div className="space-y-1">
              <label htmlFor="gauge" className="block font-bold">
                Thread gauge reads
              </label>
              <select
                id="gauge"
                value={gauge}
                onChange={(e) => setGauge(e.target.value as "tpi" | "pitch")}
                className={selectClass}
              >
                <option value="tpi">threads per inch</option>
                <option value="pitch">pitch in mm</option>
              </select>
            </div>
            <Field
              id="count"
              label={gauge === "tpi" ? "Threads per inch" : "Pitch"}
              mono
              inputMode="decimal"
              suffix={gauge === "tpi" ? "tpi" : "mm"}
              value={count}
              onChange={(e) => setCount(e.target.value)}
              onFocus={() => setActive("pitch")}
              error={errorFor(found.error, gauge)}
            />
          </>
        }
        drawing={<ThreadDrawing active={active} />}
        caption="Measure over the crests where the thread is unworn; count the threads over an inch, or use a gauge."
      />
      <section aria-live="polite" className="space-y-3" aria-label="Threads it could be">
        {best && bestThread && (
          <OrderCard
            title="The thread"
            label={bestThread}
            details={
              <p>
                {best.seriesName}, {best.angle}° thread{best.taper ? `; ${best.taper}` : ""}.
                {best.greaseFitting && ` Grease fittings are made in this thread: ${best.greaseFitting}.`}
              </p>
            }
            notes={[]}
            source={best.source}
          >
            <ResultActions
              kind={best.greaseFitting ? "grease_fitting" : "thread"}
              designation={best.greaseFitting ? `Grease fitting ${best.greaseFitting}, straight` : bestThread}
              measurements={measuredValues([["outer", settled.diameter]], unit)}
            />
          </OrderCard>
        )}
        <WarningList warnings={best?.warnings} />
        {found.data && (
          <CandidatesTable
            caption="Threads near the measured one"
            unit={unit}
            emptyText="No standard thread has this diameter and pitch: check the gauge over more threads."
            rows={found.data.candidates.map((c) => ({
              key: c.designation,
              name: c.designation,
              detail: `${c.seriesName}, ${c.angle}°`,
              score: c.score,
              deviations: c.deviations,
              warnings: c === best ? [] : c.warnings,
            }))}
          />
        )}
      </section>
      <section aria-labelledby="grease-heading" className="space-y-2 rounded-lg border border-rule bg-ground-sunk p-4">
        <h2 id="grease-heading" className="text-xl">
          Grease fittings
        </h2>
        <p>Grease fittings are made in these threads, each straight, at 45° and at 90°:</p>
        <ul className="list-disc space-y-1 pl-5">
          {GREASE_FITTINGS.threads.map((g) => (
            <li key={g.thread}>
              <span className="num font-bold">{g.thread}</span>: {g.note}
            </li>
          ))}
        </ul>
        <p className="text-sm text-ink-soft">Source: {GREASE_FITTINGS.source}.</p>
      </section>
    </div>
  );
}
