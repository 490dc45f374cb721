import { Cautions } from "@/components/safety/cautions";
import { FIT_NAMES } from "@/lib/catalogue/kinds";
import { standardSizes } from "@/lib/catalogue/sizes";
import type { ListView } from "@/lib/lists/lists";

/**
 * The list as a sheet to order from and take to the bench: what to ask for first, sizes to check it against, the
 * factory number with the older numbers of its chain (from the catalogue, never what was typed), and the cautions for
 * the work. Set tight enough that a ten-line list fits one A4 or Letter page.
 */
export function ListSheet({ view }: { view: ListView }) {
  const supplierColumn = view.lines.some((l) => l.supplier || l.supplierNumber || l.unitPrice);
  const total = view.lines.reduce((s, l) => s + l.quantity, 0);
  return (
    <article className="sheet space-y-3">
      <header className="space-y-0.5">
        <p className="text-xs tracking-wide text-ink-soft uppercase">
          Understudy job list · printed {new Date().toUTCString().slice(5, 16)}
        </p>
        <h1 className="text-2xl">{view.title}</h1>
        {view.machine && (
          <p className="font-bold">
            {view.machine.maker} {view.machine.model}
            {view.machineSerial && <span className="num font-normal"> · serial {view.machineSerial}</span>}
          </p>
        )}
        {view.notes && <p className="text-sm whitespace-pre-line">{view.notes}</p>}
      </header>
      <table className="sheet-table w-full border-collapse text-left text-[0.8rem] leading-snug">
        <thead>
          <tr className="border-b-2 border-ink">
            <th scope="col" className="w-6 py-1 pr-1">
              ✓
            </th>
            <th scope="col" className="py-1 pr-2 text-right">
              Qty
            </th>
            <th scope="col" className="py-1 pr-2">
              Order as
            </th>
            <th scope="col" className="py-1 pr-2">
              Factory number
            </th>
            <th scope="col" className="py-1 pr-2">
              Part
            </th>
            {supplierColumn && (
              <th scope="col" className="py-1 pr-2">
                Supplier
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {view.lines.map((l) => (
            <tr key={l.id} className="border-b border-rule align-top" data-testid="sheet-line">
              <td className="py-1 pr-1">{l.ordered ? "☑" : "☐"}</td>
              <td className="py-1 pr-2 text-right num text-base font-bold">{l.quantity}</td>
              <td className="py-1 pr-2">
                <span className="block num font-bold">
                  {l.chosen?.designation ?? l.method ?? "no approved standard part"}
                </span>
                {l.chosen && (
                  <span className="block num text-xs">
                    {standardSizes(l.chosen)}
                    {standardSizes(l.chosen) && " · "}
                    {l.measured ? "sized from measurements" : FIT_NAMES[l.chosen.fit].word.toLowerCase()}
                  </span>
                )}
              </td>
              <td className="py-1 pr-2 num">
                {l.partId === null ? "—" : l.number}
                {l.earlierNumbers.length > 0 && (
                  <span className="block text-xs">was {l.earlierNumbers.join(", ")}</span>
                )}
              </td>
              <td className="py-1 pr-2">
                {l.description}
                {l.partId !== null && <span className="text-xs"> · {l.maker}</span>}
                {l.notes && <span className="block text-xs italic">{l.notes}</span>}
              </td>
              {supplierColumn && (
                <td className="py-1 pr-2 text-xs">
                  {l.supplier}
                  {l.supplierNumber && <span className="block num">{l.supplierNumber}</span>}
                  {l.unitPrice && <span className="block num">@ {l.unitPrice}</span>}
                </td>
              )}
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr>
            <td />
            <td className="py-1 pr-2 text-right num font-bold">{total}</td>
            <td colSpan={supplierColumn ? 4 : 3} className="py-1 pr-2 text-xs">
              {view.totals.map((t) => `${t.name} ${t.quantity}`).join(" · ")}
            </td>
          </tr>
        </tfoot>
      </table>
      {view.lines.some((l) => l.warnings.length > 0) && (
        <section className="text-xs">
          <h2 className="text-sm font-bold">Check before ordering</h2>
          <ul className="list-disc pl-5">
            {view.lines.flatMap((l) => l.warnings.map((w) => <li key={`${l.id}-${w}`}>{w}</li>))}
          </ul>
        </section>
      )}
      <p className="text-xs text-ink-soft">
        Measure the old part before you order: the catalogue records what members fitted, not a guarantee.
      </p>
      {view.cautions.length > 0 && <Cautions kinds={view.cautions} compact />}
    </article>
  );
}
