"use client";

import { useState } from "react";
import { useDebounced } from "@/lib/hooks/use-api";
import { useLengthUnit } from "@/lib/hooks/use-length-unit";
import { convertTypedSizes, type LengthUnit } from "@/lib/standards/units";

/**
 * A calculator's measured sizes as typed, in the unit the calipers read: the unit switch converts what was typed, and
 * `settled` is what the calculator asks about once typing pauses.
 */
export function useMeasuredSizes<N extends string>(names: readonly N[]) {
  const [unit, setUnit] = useLengthUnit();
  const [sizes, setSizes] = useState(() => Object.fromEntries(names.map((n) => [n, ""])) as Record<N, string>);
  const changeUnit = (next: LengthUnit) => {
    setSizes((s) => convertTypedSizes(s, [...names], unit, next));
    setUnit(next);
  };
  const set = (name: N) => (value: string) => setSizes((s) => ({ ...s, [name]: value }));
  return { unit, changeUnit, sizes, set, settled: useDebounced(sizes) };
}
