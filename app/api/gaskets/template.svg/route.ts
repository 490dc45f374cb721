import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { gasketSvg } from "@/lib/standards/gasket-drawing";
import { readGasketQuery } from "@/lib/validation/standards";

export const runtime = "nodejs";

/** A gasket template drawn at full size: SVG whose width and height are millimetres or inches. */
export const GET = handle(async (request) => {
  const template = readGasketQuery(queryOf(request));
  return new Response(gasketSvg(template), {
    headers: { "content-type": "image/svg+xml; charset=utf-8", "content-disposition": 'inline; filename="gasket.svg"' },
  });
});
