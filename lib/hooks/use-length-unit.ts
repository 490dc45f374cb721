"use client";

import { useCallback, useSyncExternalStore } from "react";
import type { LengthUnit } from "@/lib/standards/units";

const KEY = "understudy:unit";
const CHANGE = "understudy:unit-change";

// Where storage is refused (some private windows), the choice lasts for this page only.
let unstored: LengthUnit | null = null;

function read(): LengthUnit {
  try {
    return window.localStorage.getItem(KEY) === "mm" ? "mm" : "in";
  } catch {
    return unstored ?? "in";
  }
}

function subscribe(onChange: () => void) {
  window.addEventListener("storage", onChange);
  window.addEventListener(CHANGE, onChange);
  return () => {
    window.removeEventListener("storage", onChange);
    window.removeEventListener(CHANGE, onChange);
  };
}

/**
 * The unit the calipers read in, remembered per browser and shared by every calculator. A first visit is in inches:
 * most of these machines were built to inch sizes.
 */
export function useLengthUnit(): [LengthUnit, (unit: LengthUnit) => void] {
  const unit = useSyncExternalStore(subscribe, read, () => "in" as const);
  const setUnit = useCallback((next: LengthUnit) => {
    try {
      window.localStorage.setItem(KEY, next);
    } catch {
      unstored = next;
    }
    window.dispatchEvent(new Event(CHANGE));
  }, []);
  return [unit, setUnit];
}
