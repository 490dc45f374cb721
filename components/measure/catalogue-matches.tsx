import Link from "next/link";
import type { SizedPart } from "@/lib/catalogue/find-by-size";
import { fromMm, showLength } from "@/lib/standards/units";

/** Original factory parts whose documented sizes match the measurement: a way to name an unnumbered part. */
export function CatalogueMatches({ parts, unit }: { parts: SizedPart[] | undefined; unit: "mm" | "in" }) {
  if (!parts || parts.length === 0) return null;
  const show = (mm: number) => showLength(fromMm(mm, unit), unit);
  return (
    <section
      aria-labelledby="catalogue-matches-heading"
      className="space-y-2 rounded-lg border border-rule bg-ground-sunk p-4"
    >
      <h3 id="catalogue-matches-heading" className="text-lg">
        Factory parts of this size in the catalogue
      </h3>
      <ul className="grid gap-2 sm:grid-cols-2">
        {parts.map((p) => (
          <li key={p.id} className="rounded-md border border-rule bg-ground-raised p-3">
            <Link href={`/parts/${p.id}`} className="num font-bold">
              {p.number}
            </Link>
            <span className="block text-sm text-ink-soft">
              {p.maker} · {p.description}
            </span>
            <span className="block num text-sm">
              {p.innerMm === null ? `Ø ${show(p.outerMm)}` : `${show(p.innerMm)} × ${show(p.outerMm)}`}
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}
