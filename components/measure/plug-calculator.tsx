"use client";

import { useState } from "react";
import { CatalogueMatches } from "@/components/measure/catalogue-matches";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { SizeField } from "@/components/measure/size-field";
import { UnitSwitch } from "@/components/measure/unit-switch";
import { WarningList } from "@/components/measure/warning-list";
import { PlugDrawing } from "@/components/measure/workshop-drawings";
import { Notice } from "@/components/ui/notice";
import { useDebounced } from "@/lib/hooks/use-api";
import { usePlugMatch } from "@/lib/hooks/use-calculators";
import { useLengthUnit } from "@/lib/hooks/use-length-unit";
import { convertTyped, measuredValues, showDeviation, type LengthUnit } from "@/lib/standards/units";

/** A core or felt bore measured: the cup or disc plug to ask for, with the inch and metric near miss. */
export function PlugCalculator() {
  const [unit, setUnit] = useLengthUnit();
  const [bore, setBore] = useState("");
  const [kind, setKind] = useState<"cup" | "disc">("cup");
  const [active, setActive] = useState(false);
  const changeUnit = (next: LengthUnit) => {
    setBore((b) => convertTyped(b, unit, next));
    setUnit(next);
  };
  const settled = useDebounced(bore);
  const plug = usePlugMatch({ bore: settled, unit, kind });
  const otherError = unplacedError(plug.error, ["bore"]);
  const data = plug.data;
  const best = data?.candidates[0];

  return (
    <div className="space-y-8">
      <div className="grid gap-6 md:grid-cols-[1fr_20rem]">
        <div className="space-y-4">
          <UnitSwitch unit={unit} onChange={changeUnit} />
          <div className="grid gap-4 sm:grid-cols-2">
            <SizeField
              id="bore"
              label="Bore"
              hint="Across the hole, where the plug's edge grips."
              value={bore}
              onChange={setBore}
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
          </div>
        </div>
        <figure className="rounded-lg border border-rule bg-ground-raised p-3">
          <PlugDrawing active={active} kind={kind} />
          <figcaption className="text-sm text-ink-soft">
            Measure across two diameters at right angles: a corroded bore is seldom round.
          </figcaption>
        </figure>
      </div>
      {otherError && (
        <Notice tone="caution" role="alert">
          {otherError}
        </Notice>
      )}
      <section aria-live="polite" aria-busy={plug.isLoading} className="space-y-3" aria-label="Plug to ask for">
        {data && best && (
          <OrderCard title="The plug to ask for" label={best.label} notes={data.notes} source={data.source}>
            <ResultActions
              kind="plug"
              designation={best.label}
              note={`bore measured ${settled} ${unit}`}
              measurements={measuredValues([["outer", settled]], unit)}
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
