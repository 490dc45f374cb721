import { ConnectionError, DatabaseError } from "sequelize";
import { AppError, errorBody, type ErrorBody } from "@/lib/errors";
import { MAX_BODY_BYTES } from "@/lib/http/origin";

/** Reads a JSON body with a size cap, so an oversized or malformed body is a 400 and never reaches the parser whole. */
export async function readJson(request: Request): Promise<unknown> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > MAX_BODY_BYTES) throw tooLarge();
  const reader = request.body?.getReader();
  if (!reader) return {};
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > MAX_BODY_BYTES) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(Buffer.concat(chunks)).trim();
  } catch {
    throw new AppError("validation_failed", "The request body is not UTF-8 text.", { field: "body" });
  }
  if (text === "") return {};
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError("validation_failed", "The request body is not valid JSON.", { field: "body" });
  }
  assertPlainText(value, []);
  return value;
}

/** Why a string cannot be stored as text, or null: PostgreSQL refuses NUL, and a lone surrogate is no character. */
export function textFault(value: string): string | null {
  if (value.includes("\u0000")) return "contains a NUL character";
  if (!value.isWellFormed()) return "contains a broken character (a lone UTF-16 surrogate)";
  return null;
}

/** Every string in a parsed body, keys included, is text that can be stored; the first that is not is a 400. */
function assertPlainText(value: unknown, path: string[]): void {
  if (typeof value === "string") {
    const fault = textFault(value);
    if (fault) {
      const field = path.length > 0 ? path.join(".") : "body";
      throw new AppError("validation_failed", `This text ${fault}.`, {
        field,
        fields: { [field]: `This text ${fault}.` },
      });
    }
  } else if (Array.isArray(value)) {
    value.forEach((item, i) => assertPlainText(item, [...path, String(i)]));
  } else if (value && typeof value === "object") {
    for (const [key, item] of Object.entries(value)) {
      assertPlainText(key, path);
      assertPlainText(item, [...path, key]);
    }
  }
}

function tooLarge(): AppError {
  return new AppError("validation_failed", `The request body is larger than ${MAX_BODY_BYTES / 1024} KB.`, {
    field: "body",
  });
}

const DATABASE_RETRY_SECONDS = 30;

// PostgreSQL's codes for a server going away or not yet taking connections (admin shutdown, crash shutdown, cannot
// connect now) and for a connection lost in the middle of a query.
const OUTAGE_CODES = new Set(["57P01", "57P02", "57P03", "08000", "08001", "08003", "08004", "08006"]);

/** The database is down, restarting or out of reach (a connection refused, lost, or not had in time from the pool). */
function isDatabaseUnavailable(error: unknown): boolean {
  if (error instanceof ConnectionError) return true;
  if (error instanceof DatabaseError) {
    const parent = error.parent as { code?: string; message?: string } | undefined;
    if (parent?.code !== undefined && OUTAGE_CODES.has(parent.code)) return true;
    // A pooled connection cut under a query (the server restarted, the network dropped) has no SQLSTATE, only the
    // driver's words or the socket's error code.
    return /Connection terminated|connection error|not queryable|ECONNRESET|EPIPE|ECONNREFUSED/i.test(
      `${parent?.code ?? ""} ${parent?.message ?? ""}`,
    );
  }
  return false;
}

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    const headers: Record<string, string> = {};
    if (error.options.retryAfterSeconds) headers["Retry-After"] = String(error.options.retryAfterSeconds);
    return Response.json(errorBody(error), { status: error.status, headers });
  }
  if (isDatabaseUnavailable(error)) {
    console.error("[understudy] database unavailable", error instanceof Error ? error.message : error);
    const body: ErrorBody = {
      error: "unavailable",
      message: "The catalogue's database is not answering just now. Please try again in a minute.",
    };
    return Response.json(body, { status: 503, headers: { "Retry-After": String(DATABASE_RETRY_SECONDS) } });
  }
  console.error("[understudy] unexpected error", error);
  const body: ErrorBody = { error: "internal", message: "Something went wrong on our side. Please try again." };
  return Response.json(body, { status: 500 });
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/**
 * Wraps a route handler so that every thrown error becomes one JSON shape with the right status. An answer that
 * does not say how it may be cached is kept by nobody (`private, no-store`): only the answers that are the same for
 * everyone say otherwise (lib/http/cache.ts).
 */
export function handle<C>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    let response: Response;
    try {
      response = await handler(request, context);
    } catch (error) {
      response = errorResponse(error);
    }
    if (!response.headers.has("Cache-Control")) {
      try {
        response.headers.set("Cache-Control", "private, no-store");
      } catch {
        // A redirect's headers cannot be changed; it carries nothing to keep.
      }
    }
    return response;
  };
}
