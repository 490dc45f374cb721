import Link from "next/link";

/** A gasket kept as its template: a small drawing, and the full-size sheets to print and cut from. */
export function TemplateLinks({ query, title }: { query: string; title: string }) {
  return (
    <div className="flex flex-wrap items-center gap-4" data-testid="gasket-template">
      {/* eslint-disable-next-line @next/next/no-img-element -- an SVG drawn by the app's own route */}
      <img
        src={`/api/gaskets/template.svg?${query}`}
        alt={`Template: ${title}`}
        className="h-24 w-24 rounded border border-rule bg-white object-contain p-1"
      />
      <p className="space-x-3">
        <span className="font-bold">Template:</span>
        <Link href={`/measure/gasket/print?${query}&paper=a4`}>print on A4</Link>
        <Link href={`/measure/gasket/print?${query}&paper=letter`}>on Letter</Link>
        <a href={`/api/gaskets/template.svg?${query}`} download="gasket.svg">
          SVG
        </a>
      </p>
    </div>
  );
}
