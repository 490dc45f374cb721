import { readFile } from "node:fs/promises";
import path from "node:path";

export const runtime = "nodejs";

/** The sample spreadsheet from fixtures/, with good rows and the usual mistakes, for trying an import. */
export async function GET() {
  const body = await readFile(path.join(process.cwd(), "fixtures/imports/club-interchange-sample.csv"));
  return new Response(body, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": 'attachment; filename="club-interchange-sample.csv"',
    },
  });
}
