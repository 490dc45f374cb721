import { AppError, errorBody, type ErrorBody } from "@/lib/errors";

const MAX_JSON_BYTES = 64 * 1024;

/** Reads a JSON body with a size cap, so an oversized or malformed body is a 400 and never reaches the parser whole. */
export async function readJson(request: Request): Promise<unknown> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > MAX_JSON_BYTES) throw tooLarge();
  const reader = request.body?.getReader();
  if (!reader) return {};
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > MAX_JSON_BYTES) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  const text = Buffer.concat(chunks).toString("utf8").trim();
  if (text === "") return {};
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError("validation_failed", "The request body is not valid JSON.", { field: "body" });
  }
}

function tooLarge(): AppError {
  return new AppError("validation_failed", `The request body is larger than ${MAX_JSON_BYTES / 1024} KB.`, {
    field: "body",
  });
}

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    const headers: Record<string, string> = {};
    if (error.options.retryAfterSeconds) headers["Retry-After"] = String(error.options.retryAfterSeconds);
    return Response.json(errorBody(error), { status: error.status, headers });
  }
  console.error("[understudy] unexpected error", error);
  const body: ErrorBody = { error: "internal", message: "Something went wrong on our side. Please try again." };
  return Response.json(body, { status: 500 });
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/** Wraps a route handler so that every thrown error becomes one JSON shape with the right status. */
export function handle<C>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await handler(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}
