import { getPart } from "@/lib/catalogue/get-part";
import { publicJson } from "@/lib/http/cache";
import { handle } from "@/lib/http/handle";
import { idParam } from "@/lib/validation/ids";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const { id } = parseWith(idParam, await params);
  return publicJson(request, { readsCatalogue: true }, () => getPart(id));
});
