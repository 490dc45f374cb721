import { handle } from "@/lib/http/handle";
import { listAccess } from "@/lib/lists/access";
import { csvFileName, getList, listCsv } from "@/lib/lists/lists";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";

export const runtime = "nodejs";

/** The order list as CSV (UTF-8 with a byte-order mark, so spreadsheet programs read the × and accents). */
export const GET = handle<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const { id } = parseWith(idParam, await params);
  const view = await getList(await listAccess(request), id);
  return new Response(`\uFEFF${listCsv(view)}`, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${csvFileName(view)}"`,
      "Cache-Control": "private, no-store",
    },
  });
});
