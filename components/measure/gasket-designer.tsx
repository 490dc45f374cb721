"use client";

import Link from "next/link";
import { useMemo, useState } from "react";
import { OrderCard } from "@/components/measure/order-card";
import { ResultActions } from "@/components/measure/result-actions";
import { SizeField } from "@/components/measure/size-field";
import { UnitSwitch } from "@/components/measure/unit-switch";
import { WarningList } from "@/components/measure/warning-list";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { drawGasket, type GasketDrawing } from "@/lib/standards/gasket-drawing";
import {
  describeTemplate,
  gasketMaterial,
  GasketInputError,
  readTemplate,
  templateQuery,
  templateWarnings,
  type GasketTemplate,
} from "@/lib/standards/gaskets";
import { useLengthUnit } from "@/lib/hooks/use-length-unit";
import { toQuery, type DesignerValues } from "@/lib/measure/gasket-form";
import { round, type LengthUnit } from "@/lib/standards/units";

type Reading = { template: GasketTemplate; drawing: GasketDrawing } | { field: string; message: string } | null;

/** The template read by the standards engine in the browser: the same code the API and the print page run. */
function read(v: DesignerValues, unit: LengthUnit): Reading {
  const required = v.outline === "circle" ? v.od : v.outline === "rect" ? v.width && v.height : v.points;
  if (!required || !required.trim()) return null;
  try {
    const template = readTemplate(toQuery(v, unit));
    return { template, drawing: drawGasket(template) };
  } catch (error) {
    if (error instanceof GasketInputError) return { field: error.field, message: error.message };
    throw error;
  }
}

/** The fields that show their own error; any other goes above the result. */
const PLACED = [
  "od",
  "width",
  "height",
  "radius",
  "points",
  "bore",
  "cutouts",
  "holes",
  "pcd",
  "angle",
  "holeAt",
  "hole",
];

const selectClass = "min-h-12 w-full rounded-md border-2 border-rule-strong bg-ground-raised px-3 text-lg";

/** Describe a flat gasket, see it drawn, print it at full size, and put it on a job list. */
export function GasketDesigner({ initial, initialUnit }: { initial: DesignerValues; initialUnit: LengthUnit | null }) {
  const [storedUnit, setUnit] = useLengthUnit();
  const [chosenUnit, setChosenUnit] = useState<LengthUnit | null>(initialUnit);
  const unit = chosenUnit ?? storedUnit;
  const [v, setValues] = useState(initial);
  const set = (name: keyof DesignerValues) => (value: string) => setValues((s) => ({ ...s, [name]: value }));
  const reading = useMemo(() => read(v, unit), [v, unit]);
  const error = reading && "field" in reading ? reading : null;
  const ok = reading && "template" in reading ? reading : null;
  const at = (field: string) => (error?.field === field ? error.message : undefined);
  const changeUnit = (next: LengthUnit) => {
    setChosenUnit(next);
    setUnit(next);
  };

  return (
    <div className="space-y-8">
      <div className="grid gap-6 md:grid-cols-[1fr_22rem]">
        <form className="space-y-5" onSubmit={(e) => e.preventDefault()} aria-label="The gasket">
          <UnitSwitch unit={unit} onChange={changeUnit} />
          <OutlineFields v={v} set={set} at={at} unit={unit} />
          <HoleFields v={v} set={set} at={at} unit={unit} />
          <div className="space-y-1">
            <label htmlFor="gasket-use" className="block font-bold">
              What it seals
            </label>
            <select id="gasket-use" value={v.use} onChange={(e) => set("use")(e.target.value)} className={selectClass}>
              <option value="water">Water and antifreeze</option>
              <option value="oil">Oil</option>
              <option value="fuel">Petrol, paraffin or diesel</option>
              <option value="exhaust">Exhaust</option>
            </select>
          </div>
        </form>
        <Preview reading={ok} />
      </div>
      {error && !PLACED.includes(error.field) && (
        <Notice tone="caution" role="alert">
          {error.message}
        </Notice>
      )}
      {ok && <Result template={ok.template} />}
      {!reading && (
        <p className="text-ink-soft">Give the outline&apos;s size; the template is drawn here as you type.</p>
      )}
    </div>
  );
}

type FieldProps = {
  v: DesignerValues;
  set: (name: keyof DesignerValues) => (value: string) => void;
  at: (field: string) => string | undefined;
  unit: LengthUnit;
};

function OutlineFields({ v, set, at, unit }: FieldProps) {
  return (
    <fieldset className="space-y-3 rounded-lg border border-rule p-4">
      <legend className="px-1 font-bold">Outline</legend>
      <select
        aria-label="Shape of the outline"
        value={v.outline}
        onChange={(e) => set("outline")(e.target.value)}
        className={selectClass}
      >
        <option value="circle">Round</option>
        <option value="rect">Rectangle, corners rounded or square</option>
        <option value="polygon">Measured points round the edge</option>
      </select>
      {v.outline === "circle" && (
        <SizeField id="od" label="Outside diameter" value={v.od} onChange={set("od")} error={at("od")} unit={unit} />
      )}
      {v.outline === "rect" && (
        <div className="grid gap-3 sm:grid-cols-3">
          <SizeField id="width" label="Width" value={v.width} onChange={set("width")} error={at("width")} unit={unit} />
          <SizeField
            id="height"
            label="Height"
            value={v.height}
            onChange={set("height")}
            error={at("height")}
            unit={unit}
          />
          <SizeField
            id="radius"
            label="Corner radius"
            hint="Optional."
            value={v.radius}
            onChange={set("radius")}
            error={at("radius")}
            unit={unit}
          />
        </div>
      )}
      {v.outline === "polygon" && (
        <TextArea
          id="points"
          label="Points round the edge, in order"
          hint="One x, y a line, from any corner: x to the right, y downwards."
          value={v.points}
          onChange={set("points")}
          error={at("points")}
        />
      )}
      <SizeField
        id="bore"
        label="Hole in the middle"
        hint="Optional: a pump shaft's or a flange's bore."
        value={v.bore}
        onChange={set("bore")}
        error={at("bore")}
        unit={unit}
      />
      <TextArea
        id="cutouts"
        label="Other cut-outs"
        hint="Optional, one a line: circle x, y, diameter or rect x, y, width, height, radius (centres)."
        value={v.cutouts}
        onChange={set("cutouts")}
        error={at("cutouts")}
      />
    </fieldset>
  );
}

function HoleFields({ v, set, at, unit }: FieldProps) {
  return (
    <fieldset className="space-y-3 rounded-lg border border-rule p-4">
      <legend className="px-1 font-bold">Bolt holes</legend>
      <select
        aria-label="Where the bolt holes are"
        value={v.holeMode}
        onChange={(e) => set("holeMode")(e.target.value)}
        className={selectClass}
      >
        <option value="circle">Evenly on a bolt circle</option>
        <option value="points">At measured positions</option>
        <option value="none">No bolt holes</option>
      </select>
      {v.holeMode === "circle" && (
        <div className="grid gap-3 sm:grid-cols-3">
          <Field
            id="holes"
            label="How many"
            mono
            inputMode="numeric"
            value={v.holes}
            onChange={(e) => set("holes")(e.target.value)}
            error={at("holes")}
          />
          <SizeField
            id="pcd"
            label="Bolt circle"
            hint="Centre to centre across."
            value={v.pcd}
            onChange={set("pcd")}
            error={at("pcd")}
            unit={unit}
          />
          <Field
            id="angle"
            label="First hole at"
            hint="Degrees clockwise from 12 o'clock."
            mono
            inputMode="decimal"
            suffix="°"
            value={v.angle}
            onChange={(e) => set("angle")(e.target.value)}
            error={at("angle")}
          />
        </div>
      )}
      {v.holeMode === "points" && (
        <TextArea
          id="holeAt"
          label="Hole centres"
          hint="One x, y a line, measured as the outline: from the centre for a round or rectangular gasket."
          value={v.holeAt}
          onChange={set("holeAt")}
          error={at("holeAt")}
        />
      )}
      {v.holeMode !== "none" && (
        <SizeField
          id="hole"
          label="Hole diameter"
          value={v.hole}
          onChange={set("hole")}
          error={at("hole")}
          unit={unit}
        />
      )}
    </fieldset>
  );
}

function TextArea(props: {
  id: string;
  label: string;
  hint: string;
  value: string;
  onChange: (value: string) => void;
  error?: string;
}) {
  return (
    <div className="space-y-1">
      <label htmlFor={props.id} className="block font-bold">
        {props.label}
      </label>
      <p id={`${props.id}-hint`} className="text-sm text-ink-soft">
        {props.hint}
      </p>
      <textarea
        id={props.id}
        rows={3}
        value={props.value}
        onChange={(e) => props.onChange(e.target.value)}
        aria-describedby={`${props.id}-hint${props.error ? ` ${props.id}-error` : ""}`}
        aria-invalid={props.error ? true : undefined}
        spellCheck={false}
        className="w-full rounded-md border-2 border-rule-strong bg-ground-raised p-3 num text-lg"
      />
      {props.error && (
        <p id={`${props.id}-error`} className="font-bold text-caution">
          {props.error}
        </p>
      )}
    </div>
  );
}

/** The template drawn to fit the panel; the crosses mark where to punch. */
function Preview({ reading }: { reading: { drawing: GasketDrawing } | null }) {
  if (!reading)
    return (
      <figure
        className={
          "flex min-h-48 items-center justify-center rounded-lg border border-dashed border-rule p-3 " + "text-ink-soft"
        }
      >
        The template appears here.
      </figure>
    );
  const d = reading.drawing;
  const pad = Math.max(d.box.width, d.box.height) * 0.04;
  return (
    <figure className="rounded-lg border border-rule bg-ground-raised p-3">
      <svg
        viewBox={`${d.box.x - pad} ${d.box.y - pad} ${d.box.width + 2 * pad} ${d.box.height + 2 * pad}`}
        role="img"
        aria-label={d.title}
        className="h-auto max-h-96 w-full"
        data-testid="gasket-preview"
      >
        <path d={d.body} fill="#efe9dc" fillRule="evenodd" stroke="#23262b" strokeWidth={pad / 8} />
        <path d={d.marks} fill="none" stroke="#8a5d12" strokeWidth={pad / 12} />
      </svg>
      <figcaption className="num text-sm text-ink-soft">
        {round(d.box.width, d.unit === "in" ? 3 : 1)} × {round(d.box.height, d.unit === "in" ? 3 : 1)} {d.unit} overall
      </figcaption>
    </figure>
  );
}

function Result({ template }: { template: GasketTemplate }) {
  const query = templateQuery(template);
  const designation = describeTemplate(template);
  const material = gasketMaterial(template.use, template.unit);
  return (
    <section aria-live="polite" className="space-y-3" aria-label="The gasket to cut">
      <OrderCard
        title="The gasket to cut"
        label={designation}
        details={
          <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[14rem_1fr]">
            <dt className="font-bold">Cut it from</dt>
            <dd>
              {material.thicknessLabel} {material.material}
            </dd>
          </dl>
        }
        notes={material.notes}
      >
        <p className="flex flex-wrap gap-x-6 gap-y-2">
          <Link href={`/measure/gasket/print?${query}&paper=a4`} className="font-bold">
            Print at full size on A4
          </Link>
          <Link href={`/measure/gasket/print?${query}&paper=letter`} className="font-bold">
            on Letter
          </Link>
          <a href={`/api/gaskets/template.svg?${query}`} download="gasket.svg" className="font-bold">
            Download the SVG
          </a>
        </p>
        <ResultActions
          kind="gasket"
          designation={designation.slice(0, 80)}
          note={`cut from ${material.thicknessLabel} ${material.short}`}
          measurements={[]}
          template={query}
        />
      </OrderCard>
      <WarningList warnings={templateWarnings(template)} />
    </section>
  );
}
