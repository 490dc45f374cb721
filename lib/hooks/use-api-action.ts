"use client";

import { useCallback, useRef, useState } from "react";
import type { ErrorBody } from "@/lib/errors";
import { sendJson, type PostResult } from "@/lib/http/post-json";

/**
 * A button that changes something on the server (remove, withdraw, commit, share): one request at a time, however
 * often it is pressed, with `pending` for the button and the API's error for the screen.
 */
export function useApiAction() {
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<ErrorBody | null>(null);
  const inFlight = useRef(false);
  const run = useCallback(async function run<T>(
    method: "POST" | "PATCH" | "DELETE",
    url: string,
    body?: unknown,
  ): Promise<PostResult<T> | null> {
    if (inFlight.current) return null;
    inFlight.current = true;
    setPending(true);
    setError(null);
    try {
      const result = await sendJson<T>(method, url, body);
      if (!result.ok) setError(result.error);
      return result;
    } finally {
      inFlight.current = false;
      setPending(false);
    }
  }, []);
  return { run, pending, error, setError };
}
