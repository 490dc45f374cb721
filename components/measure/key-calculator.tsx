"use client";

import { useState } from "react";
import { CandidatesTable } from "@/components/measure/candidates-table";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { MeasurePanel } from "@/components/measure/measure-panel";
import { NumberDecode } from "@/components/measure/number-decode";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { SizeField } from "@/components/measure/size-field";
import { WoodruffDrawing, type KeyDimension } from "@/components/measure/small-part-drawings";
import { useDebounced } from "@/lib/hooks/use-api";
import { useParallelKey, useWoodruffDecode, useWoodruffMatch } from "@/lib/hooks/use-calculators";
import { useMeasuredSizes } from "@/lib/hooks/use-measured-sizes";
import { lengthLabel, measuredValues } from "@/lib/standards/units";
import type { WoodruffKey } from "@/lib/standards/keys";

const keySizes = (k: WoodruffKey) =>
  `${lengthLabel(k.width, k.unit)} wide, ${lengthLabel(k.diameter, k.unit)} across, ${k.height} ${k.unit} high`;

/** Woodruff keys by number or measurement, and the parallel key for a shaft. */
export function KeyCalculator() {
  const [number, setNumber] = useState("");
  const settledNumber = useDebounced(number);
  const decoded = useWoodruffDecode(settledNumber);
  const { unit, changeUnit, sizes, set, settled } = useMeasuredSizes(
    ["width", "diameter", "height", "shaft"] as const,
    "key",
  );
  const [active, setActive] = useState<KeyDimension>(null);
  const match = useWoodruffMatch({ width: settled.width, diameter: settled.diameter, height: settled.height, unit });
  const parallel = useParallelKey({ shaft: settled.shaft, unit });
  const best = match.data?.candidates[0];
  const parallelBest =
    parallel.data &&
    (unit === "in" ? (parallel.data.inch ?? parallel.data.metric) : (parallel.data.metric ?? parallel.data.inch));

  return (
    <div className="space-y-10">
      <NumberDecode
        id="woodruff-number"
        heading="Read a Woodruff key's number"
        label="Key number"
        hint="Stamped on the key's side: 606, No. 1212, or DIN 6888 6 × 9."
        placeholder="606"
        value={number}
        onChange={setNumber}
        error={decoded.error?.message}
      >
        {decoded.data && (
          <OrderCard
            title="The key"
            label={decoded.data.label}
            notes={[keySizes(decoded.data)]}
            source={decoded.data.source}
          >
            <ResultActions kind="key" designation={decoded.data.label} measurements={[]} />
          </OrderCard>
        )}
      </NumberDecode>

      <section aria-labelledby="woodruff-measure" className="space-y-4">
        <h2 id="woodruff-measure" className="text-2xl">
          No number? Measure the key
        </h2>
        <MeasurePanel
          unit={unit}
          onUnit={changeUnit}
          error={unplacedError(match.error, ["width", "diameter", "height"])}
          fields={
            <>
              <SizeField
                id="width"
                label="Width"
                value={sizes.width}
                onChange={set("width")}
                onFocus={() => setActive("width")}
                error={errorFor(match.error, "width")}
                unit={unit}
              />
              <SizeField
                id="diameter"
                label="Diameter"
                hint="Across the round side."
                value={sizes.diameter}
                onChange={set("diameter")}
                onFocus={() => setActive("diameter")}
                error={errorFor(match.error, "diameter")}
                unit={unit}
              />
              <SizeField
                id="height"
                label="Height"
                hint="Optional."
                value={sizes.height}
                onChange={set("height")}
                onFocus={() => setActive("height")}
                error={errorFor(match.error, "height")}
                unit={unit}
              />
            </>
          }
          drawing={<WoodruffDrawing active={active} />}
          caption="Measure the width on an unworn part of the key: its sides wear where the pulley drove it."
        />
        <div aria-live="polite" className="space-y-3">
          {best && (
            <OrderCard title="The key to ask for" label={best.label} notes={[keySizes(best)]} source={best.source}>
              <ResultActions
                kind="key"
                designation={best.label}
                measurements={measuredValues(
                  [
                    ["width", settled.width],
                    ["outer", settled.diameter],
                  ],
                  unit,
                )}
              />
            </OrderCard>
          )}
          {match.data && (
            <CandidatesTable
              caption="Woodruff keys near the measured one"
              unit={unit}
              emptyText="No Woodruff key of either standard is this size: check the width, or cut one from key steel."
              rows={match.data.candidates.map((c) => ({
                key: c.number,
                name: c.label.replace(/^Woodruff key /, ""),
                score: c.score,
                deviations: c.deviations,
                warnings: c.warnings,
              }))}
            />
          )}
        </div>
      </section>

      <section
        aria-labelledby="parallel-heading"
        className="space-y-3 rounded-lg border border-rule bg-ground-sunk p-4"
      >
        <h2 id="parallel-heading" className="text-xl">
          A parallel key for a shaft
        </h2>
        <div className="max-w-xs">
          <SizeField
            id="shaft"
            label="Shaft diameter"
            value={sizes.shaft}
            onChange={set("shaft")}
            error={errorFor(parallel.error, "shaft")}
            unit={unit}
          />
        </div>
        {parallel.data && parallelBest && (
          <OrderCard
            title="The key to ask for"
            label={parallelBest.label}
            notes={[
              ...(parallel.data.inch && parallel.data.metric
                ? [
                    `In the other system: ${(unit === "in" ? parallel.data.metric : parallel.data.inch).label}, ` +
                      "only if the keyway was cut to it.",
                  ]
                : []),
              ...parallel.data.notes,
            ]}
            source={parallelBest.source}
          >
            <ResultActions
              kind="key"
              designation={parallelBest.label}
              measurements={measuredValues([["inner", settled.shaft]], unit)}
            />
          </OrderCard>
        )}
      </section>
    </div>
  );
}
