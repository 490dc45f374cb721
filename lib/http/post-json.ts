import type { ErrorBody } from "@/lib/errors";
import { markConnection } from "@/lib/offline/connection";

export type PostResult<T> = { ok: true; data: T } | { ok: false; status: number; error: ErrorBody };

/** Sends JSON from the browser and returns the body or the API's error shape; a network failure becomes one too. */
export async function sendJson<T>(
  method: "POST" | "PATCH" | "DELETE",
  url: string,
  body?: unknown,
): Promise<PostResult<T>> {
  try {
    const response = await fetch(url, {
      method,
      headers: body === undefined ? {} : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    markConnection(true);
    const data = response.status === 204 ? {} : await response.json().catch(() => ({}));
    if (response.ok) return { ok: true, data: data as T };
    const error = (data as Partial<ErrorBody>).error
      ? (data as ErrorBody)
      : { error: "internal" as const, message: "Something went wrong on our side. Please try again." };
    return { ok: false, status: response.status, error };
  } catch {
    markConnection(false);
    return {
      ok: false,
      status: 0,
      error: { error: "unavailable", message: "No connection to Understudy. Check your network and try again." },
    };
  }
}
