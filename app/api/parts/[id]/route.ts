import { getPart } from "@/lib/catalogue/get-part";
import { handle } from "@/lib/http/handle";
import { idParam } from "@/lib/validation/ids";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const { id } = parseWith(idParam, await params);
  return Response.json(await getPart(id));
});
