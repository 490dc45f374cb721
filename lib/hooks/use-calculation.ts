"use client";

import { useEffect, useState } from "react";
import useSWR from "swr";
import type { ErrorBody } from "@/lib/errors";

export class CalculationError extends Error {
  constructor(readonly body: ErrorBody) {
    super(body.message);
  }
}

async function fetchJson<T>(url: string): Promise<T> {
  const response = await fetch(url);
  const body = await response.json().catch(() => null);
  if (!response.ok) {
    throw new CalculationError(
      body?.error ? body : { error: "internal", message: "The calculation could not be done just now." },
    );
  }
  return body as T;
}

/** Waits until typing pauses before the value is used, so each keystroke does not send a request. */
export function useDebounced<T>(value: T, ms = 300): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}

/**
 * One calculator route, keyed by its URL: null (inputs incomplete) asks nothing. The previous answer stays on screen
 * while the next one loads, so the table does not flicker as people type.
 */
export function useCalculation<T>(path: string | null) {
  const { data, error, isLoading, isValidating } = useSWR<T, CalculationError>(path, fetchJson, {
    keepPreviousData: true,
    revalidateOnFocus: false,
    shouldRetryOnError: false,
  });
  return { data: error ? undefined : data, error: error?.body ?? null, isLoading: isLoading || isValidating };
}

/** The query string of the filled-in fields; null while any required one is empty. */
export function calculationUrl(
  base: string,
  params: Record<string, string | boolean | undefined>,
  required: string[],
): string | null {
  if (required.some((name) => !String(params[name] ?? "").trim())) return null;
  const query = new URLSearchParams();
  for (const [name, value] of Object.entries(params)) {
    if (value === undefined || value === "" || value === false) continue;
    query.set(name, value === true ? "1" : value.trim());
  }
  return `${base}?${query}`;
}
