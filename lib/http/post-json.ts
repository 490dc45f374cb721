import type { ErrorBody } from "@/lib/errors";

export type PostResult<T> = { ok: true; data: T } | { ok: false; status: number; error: ErrorBody };

/** Posts JSON from the browser and returns the body or the API's error shape; a network failure becomes one too. */
export async function postJson<T>(url: string, body: unknown): Promise<PostResult<T>> {
  try {
    const response = await fetch(url, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(body),
    });
    const data = await response.json().catch(() => ({}));
    if (response.ok) return { ok: true, data: data as T };
    const error = (data as Partial<ErrorBody>).error
      ? (data as ErrorBody)
      : { error: "internal" as const, message: "Something went wrong on our side. Please try again." };
    return { ok: false, status: response.status, error };
  } catch {
    return {
      ok: false,
      status: 0,
      error: { error: "unavailable", message: "No connection to Understudy. Check your network and try again." },
    };
  }
}
