"use client";

import type { ReactNode } from "react";
import { UnitSwitch } from "@/components/measure/unit-switch";
import { Notice } from "@/components/ui/notice";
import type { LengthUnit } from "@/lib/standards/units";

/**
 * A calculator's measuring panel: the unit switch and the size fields beside a drawing of where to measure, and below
 * them any error the fields cannot show themselves.
 */
export function MeasurePanel({
  unit,
  onUnit,
  columns = "sm:grid-cols-3",
  fields,
  extra,
  drawing,
  caption,
  error,
}: {
  unit: LengthUnit;
  onUnit: (unit: LengthUnit) => void;
  columns?: string;
  fields: ReactNode;
  extra?: ReactNode;
  drawing: ReactNode;
  caption: ReactNode;
  error?: string | null;
}) {
  return (
    <>
      <div className="grid gap-6 md:grid-cols-[1fr_20rem]">
        <div className="space-y-4">
          <UnitSwitch unit={unit} onChange={onUnit} />
          <div className={`grid gap-4 ${columns}`}>{fields}</div>
          {extra}
        </div>
        <figure className="rounded-lg border border-rule bg-ground-raised p-3">
          {drawing}
          <figcaption className="text-sm text-ink-soft">{caption}</figcaption>
        </figure>
      </div>
      {error && (
        <Notice tone="caution" role="alert">
          {error}
        </Notice>
      )}
    </>
  );
}
