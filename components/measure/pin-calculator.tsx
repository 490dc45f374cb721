"use client";

import { useState } from "react";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { MeasurePanel } from "@/components/measure/measure-panel";
import { NumberDecode } from "@/components/measure/number-decode";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { SizeField } from "@/components/measure/size-field";
import { TaperPinDrawing, type PinDimension } from "@/components/measure/small-part-drawings";
import { useDebounced } from "@/lib/hooks/use-api";
import { useTaperPin, useTaperPinMatch } from "@/lib/hooks/use-calculators";
import { useMeasuredSizes } from "@/lib/hooks/use-measured-sizes";
import { measuredValues, showDeviation, showLength } from "@/lib/standards/units";
import type { TaperPin } from "@/lib/standards/pins";

function pinSizes(p: TaperPin): string[] {
  const ends = [
    p.largeEnd !== null ? `large end ${showLength(p.largeEnd, p.unit)}` : null,
    p.smallEnd !== null ? `small end ${showLength(p.smallEnd, p.unit)}` : null,
    p.length !== null ? `${showLength(p.length, p.unit)} long` : null,
  ].filter(Boolean);
  return [`${ends.join(", ")}; taper ${p.taper}.`];
}

/** Taper pins by number or by a measured large end, with the small end for a length. */
export function PinCalculator() {
  const [number, setNumber] = useState("");
  const settledNumber = useDebounced(number);
  const { unit, changeUnit, sizes, set, settled } = useMeasuredSizes(["largeEnd", "length"] as const, "pin");
  const [active, setActive] = useState<PinDimension>(null);
  const decoded = useTaperPin({ number: settledNumber, length: settled.length, unit });
  const match = useTaperPinMatch({ largeEnd: settled.largeEnd, length: settled.length, unit });
  const best = match.data?.candidates[0];

  return (
    <div className="space-y-10">
      <NumberDecode
        id="pin-number"
        heading="Read a taper pin's number"
        label="Pin number"
        hint="No. 4, 4/0, or ISO 2339 8 × 40. Give the length below for the small end."
        placeholder="No. 4"
        value={number}
        onChange={setNumber}
        error={decoded.error?.field === "number" ? decoded.error.message : undefined}
      >
        {decoded.data && (
          <OrderCard
            title="The pin"
            label={decoded.data.label}
            notes={pinSizes(decoded.data)}
            source={decoded.data.source}
          >
            <ResultActions kind="pin" designation={decoded.data.label} measurements={[]} />
          </OrderCard>
        )}
      </NumberDecode>

      <section aria-labelledby="pin-measure" className="space-y-4">
        <h2 id="pin-measure" className="text-2xl">
          No number? Measure the pin
        </h2>
        <MeasurePanel
          unit={unit}
          onUnit={changeUnit}
          columns="sm:grid-cols-2"
          error={unplacedError(match.error, ["largeEnd", "length"])}
          fields={
            <>
              <SizeField
                id="largeEnd"
                label="Large end"
                value={sizes.largeEnd}
                onChange={set("largeEnd")}
                onFocus={() => setActive("largeEnd")}
                error={errorFor(match.error, "largeEnd")}
                unit={unit}
              />
              <SizeField
                id="length"
                label="Length"
                hint="Needed for a metric pin."
                value={sizes.length}
                onChange={set("length")}
                onFocus={() => setActive("length")}
                error={errorFor(match.error, "length")}
                unit={unit}
              />
            </>
          }
          drawing={<TaperPinDrawing active={active} />}
          caption="Measure the large end where the punch has not spread it; a drawn pin reads a little small."
        />
        <div aria-live="polite" className="space-y-3">
          {best && (
            <OrderCard
              title="The pin to ask for"
              label={best.label}
              notes={[...pinSizes(best), ...(match.data?.notes ?? [])]}
              source={best.source}
            >
              <ResultActions
                kind="pin"
                designation={best.label}
                measurements={measuredValues(
                  [
                    ["outer", settled.largeEnd],
                    ["length", settled.length],
                  ],
                  unit,
                )}
              />
            </OrderCard>
          )}
          {match.data && match.data.candidates.length > 1 && (
            <ul
              className="space-y-1 rounded-lg border border-rule bg-ground-raised p-4"
              aria-label="Other pins it could be"
            >
              {match.data.candidates.slice(1).map((c) => (
                <li key={c.number}>
                  <span className="num font-bold">{c.label}</span>{" "}
                  <span className="text-ink-soft">
                    ({c.reason}: {showDeviation(c.deviation, unit)})
                  </span>
                </li>
              ))}
            </ul>
          )}
          {match.data && match.data.candidates.length === 0 && (
            <p className="rounded-md border border-rule bg-ground-raised p-4">
              No taper pin of either standard is this size. A metric pin is named by its small end: give the length, or
              ream the hole and fit the next size up.
            </p>
          )}
        </div>
      </section>
    </div>
  );
}
