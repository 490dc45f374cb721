"use client";

import { useState } from "react";
import { CandidatesTable } from "@/components/measure/candidates-table";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { MeasurePanel } from "@/components/measure/measure-panel";
import { NumberDecode } from "@/components/measure/number-decode";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { SizeField } from "@/components/measure/size-field";
import { ChainDrawing, type ChainDimension } from "@/components/measure/small-part-drawings";
import { WarningList } from "@/components/measure/warning-list";
import { Field } from "@/components/ui/field";
import { useDebounced } from "@/lib/hooks/use-api";
import { useChainDecode, useChainIdentify, useChainLinks } from "@/lib/hooks/use-calculators";
import { useMeasuredSizes } from "@/lib/hooks/use-measured-sizes";
import type { Chain } from "@/lib/standards/chain";
import { measuredValues, showLength } from "@/lib/standards/units";

const chainSizes = (c: Chain) => [
  `Pitch ${showLength(c.pitch, c.unit)}, roller ${showLength(c.rollerDiameter, c.unit)}, ` +
    `${showLength(c.innerWidth, c.unit)} between the inner plates.`,
  ...c.notes,
];

/** Roller chain by number or measurement, and the links for a drive. */
export function ChainCalculator() {
  const [number, setNumber] = useState("");
  const settledNumber = useDebounced(number);
  const decoded = useChainDecode(settledNumber);
  const { unit, changeUnit, sizes, set, settled } = useMeasuredSizes(
    ["pitch", "roller", "width", "center"] as const,
    "chain",
  );
  const [teeth, setTeeth] = useState({ teeth1: "", teeth2: "" });
  const settledTeeth = useDebounced(teeth);
  const [active, setActive] = useState<ChainDimension>(null);
  const found = useChainIdentify({ pitch: settled.pitch, roller: settled.roller, width: settled.width, unit });
  const chain = decoded.data ?? found.data?.candidates[0];
  const links = useChainLinks({ number: chain?.number, ...settledTeeth, center: settled.center, unit });

  return (
    <div className="space-y-10">
      <NumberDecode
        id="chain-number"
        heading="Read a chain's number"
        label="Chain number"
        hint="Stamped on the side plates: 40, 60-2, or 08B-1."
        placeholder="40"
        value={number}
        onChange={setNumber}
        error={decoded.error?.message}
      >
        {decoded.data && (
          <OrderCard
            title="The chain"
            label={decoded.data.label}
            notes={chainSizes(decoded.data)}
            source={decoded.data.source}
          >
            <ResultActions kind="chain" designation={decoded.data.label} measurements={[]} />
          </OrderCard>
        )}
      </NumberDecode>

      <section aria-labelledby="chain-measure" className="space-y-4">
        <h2 id="chain-measure" className="text-2xl">
          No number? Measure the chain
        </h2>
        <MeasurePanel
          unit={unit}
          onUnit={changeUnit}
          error={unplacedError(found.error, ["pitch", "roller", "width"])}
          fields={
            <>
              <SizeField
                id="pitch"
                label="Pitch"
                hint="Pin to pin; over ten pitches and divide."
                value={sizes.pitch}
                onChange={set("pitch")}
                onFocus={() => setActive("pitch")}
                error={errorFor(found.error, "pitch")}
                unit={unit}
              />
              <SizeField
                id="roller"
                label="Roller diameter"
                value={sizes.roller}
                onChange={set("roller")}
                onFocus={() => setActive("roller")}
                error={errorFor(found.error, "roller")}
                unit={unit}
              />
              <SizeField
                id="width"
                label="Inner width"
                hint="Optional: between the inner plates."
                value={sizes.width}
                onChange={set("width")}
                onFocus={() => setActive("width")}
                error={errorFor(found.error, "width")}
                unit={unit}
              />
            </>
          }
          drawing={<ChainDrawing active={active} />}
          caption="A worn chain reads long in pitch: measure over ten pitches with the chain pulled straight."
        />
        <div aria-live="polite" className="space-y-3">
          {found.data?.candidates[0] && (
            <OrderCard
              title="The chain to ask for"
              label={found.data.candidates[0].label}
              notes={chainSizes(found.data.candidates[0])}
              source={found.data.candidates[0].source}
            >
              <ResultActions
                kind="chain"
                designation={found.data.candidates[0].label}
                measurements={measuredValues(
                  [
                    ["length", settled.pitch],
                    ["outer", settled.roller],
                  ],
                  unit,
                )}
              />
            </OrderCard>
          )}
          <WarningList warnings={found.data?.candidates[0]?.warnings} />
          {found.data && (
            <CandidatesTable
              caption="Chains near the measured one"
              unit={unit}
              emptyText="No ANSI or ISO 606 B chain has this pitch and roller: measure over more pitches."
              rows={found.data.candidates.map((c) => ({
                key: c.number,
                name: c.label.replace(/^Roller chain /, ""),
                score: c.score,
                deviations: c.deviations,
                warnings: [],
              }))}
            />
          )}
        </div>
      </section>

      <section aria-labelledby="links-heading" className="space-y-3 rounded-lg border border-rule bg-ground-sunk p-4">
        <h2 id="links-heading" className="text-xl">
          How many links
        </h2>
        <p className="text-ink-soft">
          {chain ? `For ${chain.label.replace(/^Roller chain /, "")}.` : "Read or measure the chain above first."}
        </p>
        <div className="grid gap-4 sm:grid-cols-3">
          <Field
            id="teeth1"
            label="Small sprocket's teeth"
            mono
            inputMode="numeric"
            value={teeth.teeth1}
            onChange={(e) => setTeeth((t) => ({ ...t, teeth1: e.target.value }))}
            error={errorFor(links.error, "teeth1")}
          />
          <Field
            id="teeth2"
            label="Large sprocket's teeth"
            mono
            inputMode="numeric"
            value={teeth.teeth2}
            onChange={(e) => setTeeth((t) => ({ ...t, teeth2: e.target.value }))}
            error={errorFor(links.error, "teeth2")}
          />
          <SizeField
            id="center"
            label="Centre distance"
            value={sizes.center}
            onChange={set("center")}
            error={errorFor(links.error, "center")}
            unit={unit}
          />
        </div>
        {links.data && chain && (
          <OrderCard
            title="Links to order"
            label={`${links.data.links} links`}
            details={
              <p className="num">
                Exactly {links.data.exact} pitches; {links.data.links} links set the centres at{" "}
                {showLength(links.data.center, unit)}.
              </p>
            }
            notes={links.data.notes}
            source="Machinery's Handbook, roller chain length in pitches: 2C + (N + n)/2 + (N − n)²/(4π²C)"
          />
        )}
      </section>
    </div>
  );
}
