"use client";

import { useEffect, useRef, useState } from "react";
import { useDebounced } from "@/lib/hooks/use-api";
import { useLengthUnit } from "@/lib/hooks/use-length-unit";
import { convertTypedSizes, type LengthUnit } from "@/lib/standards/units";

const storageKey = (calculator: string) => `understudy:sizes:${calculator}`;

/** The sizes a link carries (`?shaft=1.497&bore=2.374&unit=in`), else the ones this browser last typed, else none. */
function remembered<N extends string>(
  calculator: string,
  names: readonly N[],
): Partial<Record<N, string>> & { unit?: LengthUnit } {
  const query = new URLSearchParams(window.location.search);
  const fromLink = Object.fromEntries(names.filter((n) => query.has(n)).map((n) => [n, query.get(n) ?? ""]));
  const unit = query.get("unit");
  if (Object.keys(fromLink).length > 0)
    return { ...fromLink, ...(unit === "mm" || unit === "in" ? { unit } : {}) } as Partial<Record<N, string>>;
  try {
    const stored = JSON.parse(window.localStorage.getItem(storageKey(calculator)) ?? "{}") as Record<string, unknown>;
    return Object.fromEntries(names.filter((n) => typeof stored[n] === "string").map((n) => [n, stored[n]])) as Partial<
      Record<N, string>
    >;
  } catch {
    return {};
  }
}

/**
 * A calculator's measured sizes as typed, in the unit the calipers read: the unit switch converts what was typed, and
 * `settled` is what the calculator asks about once typing pauses. The sizes survive a reload (kept in this browser)
 * and the address always carries them, so the page's link shares the measurement.
 */
export function useMeasuredSizes<N extends string>(names: readonly N[], calculator?: string) {
  const [unit, setUnit] = useLengthUnit();
  const [sizes, setSizes] = useState(() => Object.fromEntries(names.map((n) => [n, ""])) as Record<N, string>);
  // Nothing is written back until what was remembered has been restored, or the restore would be overwritten.
  const [restored, setRestored] = useState(false);
  // The names arrive as a fresh array each render; the effects follow their text.
  const fields = useRef(names);
  const namesKey = names.join(",");
  const changeUnit = (next: LengthUnit) => {
    setSizes((s) => convertTypedSizes(s, [...names], unit, next));
    setUnit(next);
  };
  const set = (name: N) => (value: string) => setSizes((s) => ({ ...s, [name]: value }));
  const settled = useDebounced(sizes);

  useEffect(() => {
    if (!calculator || restored) return;
    const { unit: linkUnit, ...kept } = remembered(calculator, fields.current);
    if (linkUnit) setUnit(linkUnit);
    if (Object.keys(kept).length > 0) setSizes((s) => ({ ...s, ...kept }));
    setRestored(true);
  }, [calculator, namesKey, restored, setUnit]);

  // What is typed is kept as it is typed (a reload a moment later keeps it too); the address follows.
  useEffect(() => {
    if (!calculator || !restored) return;
    try {
      window.localStorage.setItem(storageKey(calculator), JSON.stringify(sizes));
    } catch {
      // Storage refused (a private window): the link below still carries the sizes.
    }
    const url = new URL(window.location.href);
    for (const n of fields.current) {
      if (sizes[n]) url.searchParams.set(n, sizes[n]);
      else url.searchParams.delete(n);
    }
    if (fields.current.some((n) => sizes[n])) url.searchParams.set("unit", unit);
    else url.searchParams.delete("unit");
    window.history.replaceState(window.history.state, "", url);
  }, [calculator, namesKey, restored, sizes, unit]);

  return { unit, changeUnit, sizes, set, settled };
}
