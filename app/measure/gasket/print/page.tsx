import type { Metadata } from "next";
import Link from "next/link";
import { PrintButton } from "@/components/lists/print-button";
import { GasketSheets } from "@/components/measure/gasket-sheets";
import { Notice } from "@/components/ui/notice";
import { AppError } from "@/lib/errors";
import { drawGasket, type Paper } from "@/lib/standards/gasket-drawing";
import { templateQuery } from "@/lib/standards/gaskets";
import { readGasketQuery } from "@/lib/validation/standards";

export const metadata: Metadata = { title: "Gasket template, printable" };

type Search = Promise<Record<string, string | string[] | undefined>>;

export default async function PrintGasketPage({ searchParams }: { searchParams: Search }) {
  const params = await searchParams;
  const q = Object.fromEntries(Object.entries(params).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const paper: Paper = q.paper === "letter" ? "letter" : "a4";
  let template;
  try {
    template = readGasketQuery(q);
  } catch (error) {
    if (!(error instanceof AppError)) throw error;
    return (
      <div className="space-y-4">
        <Notice tone="caution" role="alert">
          This template cannot be drawn: {error.message}
        </Notice>
        <Link href="/measure/gasket">Draw a gasket</Link>
      </div>
    );
  }
  const query = templateQuery(template);
  return (
    <div className="space-y-4">
      <div className="no-print space-y-2">
        <p className="flex flex-wrap items-center gap-4">
          <PrintButton />
          <Link href={`/measure/gasket?${query}`}>Change the template</Link>
          <Link href={`/measure/gasket/print?${query}&paper=${paper === "a4" ? "letter" : "a4"}`}>
            On {paper === "a4" ? "Letter" : "A4"} instead
          </Link>
        </p>
        <p className="text-sm text-ink-soft">
          Print at 100 % (&quot;actual size&quot;), then measure the check bar on each page before you cut.
        </p>
      </div>
      <GasketSheets drawing={drawGasket(template)} paper={paper} />
    </div>
  );
}
