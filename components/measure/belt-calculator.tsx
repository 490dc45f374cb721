"use client";

import { useState } from "react";
import { BeltDrawing, type BeltDimension } from "@/components/measure/belt-drawing";
import { CandidatesTable } from "@/components/measure/candidates-table";
import { errorFor, unplacedError } from "@/components/measure/field-errors";
import { ResultActions } from "@/components/measure/result-actions";
import { SizeField } from "@/components/measure/size-field";
import { UnitSwitch } from "@/components/measure/unit-switch";
import { WarningList } from "@/components/measure/warning-list";
import { Notice } from "@/components/ui/notice";
import { useDebounced } from "@/lib/hooks/use-api";
import { useBeltDecode, useBeltSection, useDrive } from "@/lib/hooks/use-calculators";
import { BELT_SECTIONS } from "@/lib/standards/belt-sections";
import type { DecodedBelt } from "@/lib/standards/belts";
import type { DriveResult } from "@/lib/standards/drive";
import { useLengthUnit } from "@/lib/hooks/use-length-unit";
import { convertTypedSizes, inchLabel, measuredValues, type LengthUnit } from "@/lib/standards/units";

interface DriveAnswer extends DriveResult {
  unit: LengthUnit;
  standardLengths?: Array<{ designation: string; length: number; nearest: boolean }>;
  adjustableRange?: { shortest: number; longest: number };
}

/** 21/32 × 13/32 in for inch sections, 12.7 × 10 mm for metric ones. */
function sectionSize(belt: DecodedBelt): string {
  if (belt.unit === "mm") return `${belt.topWidth} × ${belt.height} mm`;
  return `${inchLabel(belt.topWidth).replace(" in", "")} × ${inchLabel(belt.height ?? 0)}`;
}

const SECTIONS = BELT_SECTIONS.filter((s) => s.height !== null).map((s) => s.section);

function Figure({ label, value, unit }: { label: string; value: number; unit: string }) {
  return (
    <div className="rounded-md border border-rule bg-ground-raised p-3">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd className="num text-2xl font-bold">
        {value} <span className="text-base font-normal">{unit}</span>
      </dd>
    </div>
  );
}

export function BeltCalculator({ measuringNotes }: { measuringNotes: string[] }) {
  const [unit, setUnit] = useLengthUnit();
  const [designation, setDesignation] = useState("");
  const [section, setSection] = useState({ top: "", height: "" });
  const [drive, setDrive] = useState({ large: "", small: "", center: "", length: "", smallMax: "", section: "" });
  const [know, setKnow] = useState<"center" | "length">("center");
  const [active, setActive] = useState<BeltDimension>(null);
  const changeUnit = (next: LengthUnit) => {
    setSection((s) => convertTypedSizes(s, ["top", "height"], unit, next));
    setDrive((d) => convertTypedSizes(d, ["large", "small", "center", "length", "smallMax"], unit, next));
    setUnit(next);
  };
  const settledDesignation = useDebounced(designation);
  const settledSection = useDebounced(section);
  const settledDrive = useDebounced(drive);

  const decoded = useBeltDecode(settledDesignation);
  const identified = useBeltSection({ ...settledSection, unit });
  const driveParams = {
    large: settledDrive.large,
    small: settledDrive.small,
    [know]: settledDrive[know],
    smallMax: settledDrive.smallMax,
    section: settledDrive.section,
    unit,
  };
  const solved = useDrive<DriveAnswer>(driveParams, ["large", "small", know]);
  const setD = (name: keyof typeof drive) => (value: string) => setDrive((d) => ({ ...d, [name]: value }));
  const driveOther = unplacedError(solved.error, ["large", "small", "center", "length", "smallMax", "section"]);

  return (
    <div className="space-y-10">
      <section aria-labelledby="belt-number-heading" className="space-y-3">
        <h2 id="belt-number-heading" className="text-2xl">
          Read the number on the belt
        </h2>
        <SizeField
          id="belt-designation"
          label="Belt number"
          hint="For example B60, A42, 4L380, 5V800, SPA1250, or a metric B 1600 Li."
          value={designation}
          onChange={setDesignation}
          error={errorFor(decoded.error, "designation")}
          placeholder="B60"
        />
        {decoded.data && !decoded.error && (
          <div className="space-y-3 rounded-lg border-2 border-ink/80 bg-ground-raised p-4" data-testid="belt-decoded">
            <p>
              <span className="num text-2xl font-bold">{decoded.data.designation}</span>
              <span className="ml-2 text-ink-soft">
                section {decoded.data.section}, {sectionSize(decoded.data)}, {decoded.data.angleDeg}°
              </span>
            </p>
            <dl className="grid grid-cols-3 gap-2">
              <Figure label="Inside length" value={decoded.data.insideLength} unit={decoded.data.unit} />
              <Figure label="Pitch length" value={decoded.data.pitchLength} unit={decoded.data.unit} />
              <Figure label="Outside length" value={decoded.data.outsideLength} unit={decoded.data.unit} />
            </dl>
            <ul className="space-y-1 text-sm text-ink-soft">
              {decoded.data.notes.map((n) => (
                <li key={n} className="border-l-2 border-brass pl-2">
                  {n}
                </li>
              ))}
            </ul>
            <ResultActions kind="v_belt" designation={decoded.data.designation} measurements={[]} />
          </div>
        )}
      </section>

      <div className="grid gap-6 md:grid-cols-[1fr_20rem]">
        <div className="space-y-10">
          <UnitSwitch unit={unit} onChange={changeUnit} />
          <section aria-labelledby="section-heading" className="space-y-3">
            <h2 id="section-heading" className="text-2xl">
              Which section is it?
            </h2>
            <div className="grid gap-4 sm:grid-cols-2">
              <SizeField
                id="top"
                label="Top width"
                value={section.top}
                onChange={(v) => setSection((s) => ({ ...s, top: v }))}
                onFocus={() => setActive("top")}
                error={errorFor(identified.error, "top")}
                unit={unit}
              />
              <SizeField
                id="height"
                label="Thickness"
                hint="Tells narrow belts from classical ones."
                value={section.height}
                onChange={(v) => setSection((s) => ({ ...s, height: v }))}
                onFocus={() => setActive("height")}
                error={errorFor(identified.error, "height")}
                unit={unit}
              />
            </div>
            {identified.data && (
              <CandidatesTable
                caption="Belt sections that match the measured belt"
                unit={unit}
                emptyText="No standard section is near this width."
                rows={identified.data.candidates.map((c) => ({
                  key: c.section,
                  name: c.section,
                  detail: `${c.family}, ${c.angleDeg}°`,
                  score: c.score,
                  deviations: c.deviations,
                  warnings: c.warnings,
                }))}
              />
            )}
          </section>

          <section aria-labelledby="drive-heading" className="space-y-3">
            <h2 id="drive-heading" className="text-2xl">
              Work out the drive
            </h2>
            <div className="grid gap-4 sm:grid-cols-2">
              <SizeField
                id="large"
                label="Large pulley, pitch diameter"
                value={drive.large}
                onChange={setD("large")}
                onFocus={() => setActive("large")}
                error={errorFor(solved.error, "large")}
                unit={unit}
              />
              <SizeField
                id="small"
                label="Small pulley, pitch diameter"
                value={drive.small}
                onChange={setD("small")}
                onFocus={() => setActive("small")}
                error={errorFor(solved.error, "small")}
                unit={unit}
              />
            </div>
            <fieldset className="flex flex-wrap gap-4">
              <legend className="mb-1 font-bold">I know</legend>
              {(["center", "length"] as const).map((k) => (
                <label key={k} className="flex min-h-12 items-center gap-2">
                  <input
                    type="radio"
                    name="know"
                    checked={know === k}
                    onChange={() => setKnow(k)}
                    className="h-5 w-5 accent-brass"
                  />
                  {k === "center" ? "the centre distance" : "the belt's pitch length"}
                </label>
              ))}
            </fieldset>
            <div className="grid gap-4 sm:grid-cols-2">
              {know === "center" ? (
                <SizeField
                  id="center"
                  label="Centre distance"
                  value={drive.center}
                  onChange={setD("center")}
                  onFocus={() => setActive("center")}
                  error={errorFor(solved.error, "center")}
                  unit={unit}
                />
              ) : (
                <SizeField
                  id="length"
                  label="Belt pitch length"
                  value={drive.length}
                  onChange={setD("length")}
                  onFocus={() => setActive(null)}
                  error={errorFor(solved.error, "length")}
                  unit={unit}
                />
              )}
              <div className="space-y-1">
                <label htmlFor="drive-section" className="block font-bold">
                  Belt section (for standard lengths)
                </label>
                <select
                  id="drive-section"
                  value={drive.section}
                  onChange={(e) => setD("section")(e.target.value)}
                  className="min-h-12 w-full rounded-md border-2 border-rule-strong bg-ground-raised px-3 text-lg"
                >
                  <option value="">Any</option>
                  {SECTIONS.map((s) => (
                    <option key={s}>{s}</option>
                  ))}
                </select>
              </div>
              <SizeField
                id="smallMax"
                label="Adjustable small pulley: largest pitch diameter"
                hint="For a split-flange pulley; leave empty otherwise."
                value={drive.smallMax}
                onChange={setD("smallMax")}
                onFocus={() => setActive("small")}
                error={errorFor(solved.error, "smallMax")}
                unit={unit}
              />
            </div>
            {driveOther && (
              <Notice tone="caution" role="alert">
                {driveOther}
              </Notice>
            )}
            {solved.data && (
              <div aria-live="polite" className="space-y-3" data-testid="drive-result">
                <dl className="grid grid-cols-2 gap-2 sm:grid-cols-3">
                  <Figure label="Belt pitch length" value={solved.data.pitchLength} unit={unit} />
                  <Figure label="Centre distance" value={solved.data.center} unit={unit} />
                  <Figure label="Span" value={solved.data.span} unit={unit} />
                  <Figure label="Deflection to aim for" value={solved.data.deflection} unit={unit} />
                  <Figure label="Wrap on small pulley" value={solved.data.wrapAngleSmallDeg} unit="°" />
                  <Figure label="Speed ratio" value={solved.data.ratio} unit=": 1" />
                </dl>
                <p className="text-sm text-ink-soft">
                  Deflection: press the middle of the span; 1/64 in per inch of span is the usual shop rule, not a
                  maker&apos;s figure.
                </p>
                {solved.data.standardLengths && solved.data.standardLengths.length > 0 && (
                  <div className="space-y-2 rounded-md border border-rule bg-ground-raised p-3">
                    <p>
                      Nearest standard belts:{" "}
                      {solved.data.standardLengths.map((l) => (
                        <span
                          key={l.designation}
                          className={`mr-3 num ${l.nearest ? "font-bold underline decoration-brass decoration-2" : ""}`}
                        >
                          {l.designation}
                          {l.nearest && <span className="font-sans text-sm font-normal no-underline"> (nearest)</span>}
                        </span>
                      ))}
                    </p>
                    <ResultActions
                      kind="v_belt"
                      designation={
                        (solved.data.standardLengths.find((l) => l.nearest) ?? solved.data.standardLengths[0])
                          .designation
                      }
                      measurements={measuredValues([["length", settledDrive.length]], unit)}
                    />
                  </div>
                )}
                {solved.data.adjustableRange && (
                  <p>
                    The adjustable pulley takes belts from{" "}
                    <span className="num font-bold">{solved.data.adjustableRange.shortest}</span> to{" "}
                    <span className="num font-bold">{solved.data.adjustableRange.longest}</span> {unit} pitch length.
                  </p>
                )}
                <WarningList warnings={solved.data.warnings} />
              </div>
            )}
          </section>
        </div>
        {/* The drawing and the measuring notes move together, so the drawing never covers the notes. */}
        <div className="space-y-4 self-start md:sticky md:top-4">
          <figure className="rounded-lg border border-rule bg-ground-raised p-3">
            <BeltDrawing active={active} />
            <figcaption className="text-sm text-ink-soft">
              Pitch diameters are measured where the belt&apos;s pitch line runs, a little inside the pulley rim.
            </figcaption>
          </figure>
          <section aria-labelledby="measuring-heading" className="rounded-lg border border-rule bg-ground-sunk p-4">
            <h2 id="measuring-heading" className="mb-2 text-lg">
              Measuring an old belt
            </h2>
            <ul className="list-disc space-y-1 pl-5 text-sm">
              {measuringNotes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
          </section>
        </div>
      </div>
    </div>
  );
}
