"use client";

import { useState } from "react";
import { CatalogueMatches } from "@/components/measure/catalogue-matches";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { SizeField } from "@/components/measure/size-field";
import { WarningList } from "@/components/measure/warning-list";
import { PlugDrawing } from "@/components/measure/workshop-drawings";
import { Notice } from "@/components/ui/notice";
import { MeasurePanel } from "@/components/measure/measure-panel";
import { usePlugMatch } from "@/lib/hooks/use-calculators";
import { useMeasuredSizes } from "@/lib/hooks/use-measured-sizes";
import { measuredValues, showDeviation } from "@/lib/standards/units";

/** A core or felt bore measured: the cup or disc plug to ask for, with the inch and metric near miss. */
export function PlugCalculator() {
  const { unit, changeUnit, sizes, set, settled } = useMeasuredSizes(["bore"] as const, "plug");
  const [kind, setKind] = useState<"cup" | "disc">("cup");
  const [active, setActive] = useState(false);
  const plug = usePlugMatch({ bore: settled.bore, unit, kind });
  const data = plug.data;
  const best = data?.candidates[0];

  return (
    <div className="space-y-8">
      <MeasurePanel
        unit={unit}
        onUnit={changeUnit}
        columns="sm:grid-cols-2"
        error={unplacedError(plug.error, ["bore"])}
        fields={
          <>
            <SizeField
              id="bore"
              label="Bore"
              hint="Across the hole, where the plug's edge grips."
              value={sizes.bore}
              onChange={set("bore")}
              onFocus={() => setActive(true)}
              error={errorFor(plug.error, "bore")}
              unit={unit}
            />
            <fieldset className="space-y-1">
              <legend className="font-bold">Kind of plug</legend>
              {(["cup", "disc"] as const).map((k) => (
                <label key={k} className="flex min-h-11 items-center gap-3">
                  <input
                    type="radio"
                    name="plug-kind"
                    value={k}
                    checked={kind === k}
                    onChange={() => setKind(k)}
                    className="h-6 w-6 accent-brass"
                  />
                  {k === "cup" ? "Cup plug (a pressed cup)" : "Disc plug (a shallow dome on a shoulder)"}
                </label>
              ))}
            </fieldset>
          </>
        }
        drawing={<PlugDrawing active={active} kind={kind} />}
        caption="Measure across two diameters at right angles: a corroded bore is seldom round."
      />
      <section aria-live="polite" aria-busy={plug.isLoading} className="space-y-3" aria-label="Plug to ask for">
        {data && best && (
          <OrderCard title="The plug to ask for" label={best.label} notes={data.notes} source={data.source}>
            <ResultActions
              kind="plug"
              designation={best.label}
              note={`bore measured ${settled.bore} ${unit}`}
              measurements={measuredValues([["outer", settled.bore]], unit)}
            />
          </OrderCard>
        )}
        {data?.nearMiss && <Notice tone="caution">{data.nearMiss.message}</Notice>}
        <WarningList warnings={data?.warnings} />
        {data && data.candidates.length > 1 && (
          <section aria-labelledby="plug-others" className="rounded-lg border border-rule bg-ground-raised p-4">
            <h2 id="plug-others" className="mb-2 text-lg">
              Other sizes it could be
            </h2>
            <ul className="space-y-1">
              {data.candidates.slice(1).map((c) => (
                <li key={c.label}>
                  <span className="num font-bold">{c.label}</span>{" "}
                  <span className="text-ink-soft">
                    ({c.system}, bore {showDeviation(c.deviation, data.unit)}: {c.reason})
                  </span>
                </li>
              ))}
            </ul>
          </section>
        )}
        <CatalogueMatches parts={data?.catalogueParts} unit={unit} />
        {!data && !plug.error && <p className="text-ink-soft">Enter the bore; the plug to ask for appears here.</p>}
      </section>
    </div>
  );
}
