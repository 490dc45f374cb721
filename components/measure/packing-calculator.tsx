"use client";

import { useState } from "react";
import { CatalogueMatches } from "@/components/measure/catalogue-matches";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { SizeField } from "@/components/measure/size-field";
import { WarningList } from "@/components/measure/warning-list";
import { PackingDrawing, type PackingDimension } from "@/components/measure/workshop-drawings";
import { MeasurePanel } from "@/components/measure/measure-panel";
import { usePackingSize } from "@/lib/hooks/use-calculators";
import { useMeasuredSizes } from "@/lib/hooks/use-measured-sizes";
import { measuredValues, showLength } from "@/lib/standards/units";

/** A stuffing box measured: the packing section to buy, the length of each ring and how many rings. */
export function PackingCalculator() {
  const { unit, changeUnit, sizes, set, settled } = useMeasuredSizes(["shaft", "bore", "depth"] as const, "packing");
  const [active, setActive] = useState<PackingDimension>(null);
  const packing = usePackingSize({ ...settled, unit });
  const data = packing.data;

  return (
    <div className="space-y-8">
      <MeasurePanel
        unit={unit}
        onUnit={changeUnit}
        error={unplacedError(packing.error, ["shaft", "bore", "depth"])}
        fields={
          <>
            <SizeField
              id="shaft"
              label="Shaft"
              hint="Where the packing runs."
              value={sizes.shaft}
              onChange={set("shaft")}
              onFocus={() => setActive("shaft")}
              error={errorFor(packing.error, "shaft")}
              unit={unit}
            />
            <SizeField
              id="bore"
              label="Box bore"
              value={sizes.bore}
              onChange={set("bore")}
              onFocus={() => setActive("bore")}
              error={errorFor(packing.error, "bore")}
              unit={unit}
            />
            <SizeField
              id="depth"
              label="Box depth"
              hint="Optional: for the number of rings."
              value={sizes.depth}
              onChange={set("depth")}
              onFocus={() => setActive("depth")}
              error={errorFor(packing.error, "depth")}
              unit={unit}
            />
          </>
        }
        drawing={<PackingDrawing active={active} />}
        caption="Dig out every old ring with a packing hook before you measure the box."
      />
      <section aria-live="polite" aria-busy={packing.isLoading} className="space-y-3" aria-label="Packing to buy">
        {data && (
          <OrderCard
            title="The packing to buy"
            label={data.label}
            details={
              <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[14rem_1fr]">
                <dt className="font-bold">The box leaves</dt>
                <dd className="num">{showLength(data.measuredSection, data.unit)} a side</dd>
                <dt className="font-bold">Cut each ring</dt>
                <dd className="num">{showLength(data.cutLength, data.unit)} long</dd>
                <dt className="font-bold">Rings</dt>
                <dd>{data.rings === null ? "give the box's depth to count them" : `${data.rings}`}</dd>
                <dt className="font-bold">In the other system</dt>
                <dd className="num">{data.otherSystem.sectionLabel}, only if the box was made to it</dd>
              </dl>
            }
            notes={data.notes}
          >
            <ResultActions
              kind="packing"
              designation={data.label}
              note={`cut ${showLength(data.cutLength, data.unit)}${data.rings ? `, ${data.rings} rings` : ""}`}
              measurements={measuredValues(
                [
                  ["inner", settled.shaft],
                  ["outer", settled.bore],
                  ["length", settled.depth],
                ],
                unit,
              )}
            />
          </OrderCard>
        )}
        <WarningList warnings={data?.warnings} />
        <CatalogueMatches parts={data?.catalogueParts} unit={unit} />
        {!data && !packing.error && (
          <p className="text-ink-soft">Enter the shaft and the box&apos;s bore; the packing to buy appears here.</p>
        )}
      </section>
    </div>
  );
}
