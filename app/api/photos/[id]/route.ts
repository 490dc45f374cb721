import { getCurrentSession } from "@/lib/auth/session";
import { photoForViewer } from "@/lib/proposals/views";
import { AppError } from "@/lib/errors";
import { handle } from "@/lib/http/handle";
import { getObject } from "@/lib/storage/s3";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";

export const runtime = "nodejs";

/** A proposal's photo, to its uploader and reviewers; to everyone once the proposal is in the catalogue. */
export const GET = handle<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const { id } = parseWith(idParam, await params);
  const { user } = await getCurrentSession();
  const photo = await photoForViewer(id, user);
  if (!photo) throw new AppError("not_found", "There is no photo with that id.");
  let stored;
  try {
    stored = await getObject(photo.objectKey);
  } catch {
    throw new AppError("not_found", "This photo did not reach storage.");
  }
  return new Response(Buffer.from(stored.body), {
    headers: {
      "Content-Type": photo.contentType,
      "Cache-Control": "private, max-age=3600",
      "X-Content-Type-Options": "nosniff",
      "Content-Disposition": "inline",
    },
  });
});
