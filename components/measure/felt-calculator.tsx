"use client";

import { useState } from "react";
import { CatalogueMatches } from "@/components/measure/catalogue-matches";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { SizeField } from "@/components/measure/size-field";
import { WarningList } from "@/components/measure/warning-list";
import { FeltDrawing, type FeltDimension } from "@/components/measure/workshop-drawings";
import { MeasurePanel } from "@/components/measure/measure-panel";
import { useFeltSize } from "@/lib/hooks/use-calculators";
import { useMeasuredSizes } from "@/lib/hooks/use-measured-sizes";
import { measuredValues, showLength } from "@/lib/standards/units";

/** A felt seal's groove measured: the ring to cut, the strip to cut it from, and how to fit it. */
export function FeltCalculator() {
  const { unit, changeUnit, sizes, set, settled } = useMeasuredSizes(["shaft", "bore", "width"] as const, "felt");
  const [active, setActive] = useState<FeltDimension>(null);
  const felt = useFeltSize({ ...settled, unit });
  const data = felt.data;
  const show = (v: number) => showLength(v, data?.unit ?? unit);

  return (
    <div className="space-y-8">
      <MeasurePanel
        unit={unit}
        onUnit={changeUnit}
        error={unplacedError(felt.error, ["shaft", "bore", "width"])}
        fields={
          <>
            <SizeField
              id="shaft"
              label="Shaft"
              hint="Where the felt runs."
              value={sizes.shaft}
              onChange={set("shaft")}
              onFocus={() => setActive("shaft")}
              error={errorFor(felt.error, "shaft")}
              unit={unit}
            />
            <SizeField
              id="bore"
              label="Groove bore"
              hint="Across the bottom of the groove."
              value={sizes.bore}
              onChange={set("bore")}
              onFocus={() => setActive("bore")}
              error={errorFor(felt.error, "bore")}
              unit={unit}
            />
            <SizeField
              id="width"
              label="Groove width"
              value={sizes.width}
              onChange={set("width")}
              onFocus={() => setActive("width")}
              error={errorFor(felt.error, "width")}
              unit={unit}
            />
          </>
        }
        drawing={<FeltDrawing active={active} />}
        caption="Pick the old felt out first: measure the groove itself, not the hardened felt."
      />
      <section aria-live="polite" aria-busy={felt.isLoading} className="space-y-3" aria-label="Felt to cut">
        {data && (
          <OrderCard
            title="The felt to cut"
            label={data.label}
            details={
              <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[14rem_1fr]">
                <dt className="font-bold">Ring</dt>
                <dd className="num">
                  inside {show(data.ring.inside)}, outside {show(data.ring.outside)}, thickness{" "}
                  {show(data.ring.thickness)}
                </dd>
                <dt className="font-bold">Or a strip</dt>
                <dd className="num">
                  {`${show(data.strip.width)} wide × ${show(data.strip.thickness)} thick, `}
                  {`cut ${show(data.strip.cutLength)} long`}
                </dd>
                <dt className="font-bold">Ask for</dt>
                <dd>{data.askFor}</dd>
              </dl>
            }
            notes={data.notes}
            source={data.source}
          >
            <ResultActions
              kind="felt"
              designation={data.label}
              note={
                `strip ${show(data.strip.width)} × ${show(data.strip.thickness)}, ` +
                `cut ${show(data.strip.cutLength)}`
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
        <WarningList warnings={data?.warnings} />
        <CatalogueMatches parts={data?.catalogueParts} unit={unit} />
        {!data && !felt.error && (
          <p className="text-ink-soft">Enter the shaft and the groove; the felt to cut appears here.</p>
        )}
      </section>
    </div>
  );
}
