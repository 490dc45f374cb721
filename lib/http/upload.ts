import { AppError } from "@/lib/errors";
import { env } from "@/lib/env";
import { isOwnOrigin } from "@/lib/http/origin";

/**
 * The CSRF check the request proxy makes, for a route it lets through unbuffered (so that a large body is not held
 * there): call it before anything else.
 */
export function assertOwnOrigin(request: Request): void {
  if (!isOwnOrigin(request.headers, new URL(request.url), env.APP_URL)) {
    throw new AppError(
      "forbidden_origin",
      "This request did not come from an Understudy page. Send an Origin header matching this site.",
    );
  }
}

/** A multipart upload: its declared size checked first, then the form read and its `file` field found. */
export async function readUpload(request: Request, maxBytes: number): Promise<{ file: File; form: FormData }> {
  if (Number(request.headers.get("content-length") ?? 0) > maxBytes + 1024 * 1024) {
    throw new AppError("validation_failed", `The file is larger than ${maxBytes / 1024 / 1024} MB.`, { field: "file" });
  }
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw new AppError("validation_failed", "Send the file as multipart/form-data, in a field named file.", {
      field: "file",
    });
  }
  const file = form.get("file");
  if (!(file instanceof File))
    throw new AppError("validation_failed", "Choose a CSV file to import.", { field: "file" });
  return { file, form };
}
