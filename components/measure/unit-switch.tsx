"use client";

import type { LengthUnit } from "@/lib/standards/units";

/** mm / in as two big buttons: the unit the calipers read in, and the one answers come back in. */
export function UnitSwitch({ unit, onChange }: { unit: LengthUnit; onChange: (unit: LengthUnit) => void }) {
  return (
    <fieldset className="flex items-center gap-3">
      <legend className="sr-only">Unit</legend>
      <span className="font-bold" aria-hidden="true">
        Unit
      </span>
      <div className="inline-flex overflow-hidden rounded-md border-2 border-ink/80">
        {(["in", "mm"] as const).map((u) => (
          <label
            key={u}
            className={
              `cursor-pointer px-5 py-2 text-lg font-bold ` +
              `${unit === u ? "bg-ink text-ground" : "bg-ground-raised text-ink hover:bg-ground-sunk"}`
            }
          >
            <input
              type="radio"
              name="unit"
              value={u}
              checked={unit === u}
              onChange={() => onChange(u)}
              className="sr-only"
            />
            {u === "in" ? "inch" : "mm"}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
