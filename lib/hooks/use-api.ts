"use client";

import { useEffect, useState } from "react";
import useSWR, { type SWRConfiguration } from "swr";
import type { ErrorBody } from "@/lib/errors";
import { markConnection } from "@/lib/offline/connection";

/** An API refusal as the client sees it: the API's own error shape, and the status. */
export class ApiError extends Error {
  constructor(
    readonly body: ErrorBody,
    readonly status: number,
  ) {
    super(body.message);
  }
}

/** The one fetcher: JSON on success, an `ApiError` with the API's error body otherwise (or one that says why not). */
export async function fetchJson<T>(url: string): Promise<T> {
  let response: Response;
  try {
    response = await fetch(url);
  } catch {
    markConnection(false);
    throw new ApiError({ error: "unavailable", message: "No connection to Understudy. Check your network." }, 0);
  }
  markConnection(true);
  const body = await response.json().catch(() => null);
  if (!response.ok) {
    const fallback: ErrorBody = { error: "internal", message: "That could not be loaded just now. Please try again." };
    throw new ApiError(body?.error ? body : fallback, response.status);
  }
  return body as T;
}

/**
 * The base of every resource hook in lib/hooks: one resource keyed by its API address (null asks nothing), with
 * `error` in the API's shape. The previous answer stays on screen while the next one loads, so nothing flickers.
 */
export function useApi<T>(
  url: string | null,
  options: SWRConfiguration<T, ApiError> = {},
  fetcher: (url: string) => Promise<T> = fetchJson,
) {
  const { data, error, isLoading, isValidating, mutate } = useSWR<T, ApiError>(url, fetcher, {
    keepPreviousData: true,
    revalidateOnFocus: false,
    shouldRetryOnError: false,
    ...options,
  });
  return { data: error ? undefined : data, error: error?.body ?? null, isLoading: isLoading || isValidating, mutate };
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

/** The address with the filled-in fields as its query; null while any required one is empty. */
export function apiUrl(
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
