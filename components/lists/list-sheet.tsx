import { Cautions } from "@/components/safety/cautions";
import { FIT_NAMES } from "@/lib/catalogue/kinds";
import { standardSizes } from "@/lib/catalogue/sizes";
import type { ListView } from "@/lib/lists/lists";

/** The list as a sheet to order from and take to the bench: plain table, sizes to check, cautions for the work. */
export function ListSheet({ view }: { view: ListView }) {
  return (
    <article className="sheet space-y-5">
      <header className="space-y-1">
        <p className="text-sm uppercase tracking-wide text-ink-soft">Understudy job list</p>
        <h1 className="text-3xl">{view.title}</h1>
        {view.machine && (
          <p>
            {view.machine.maker} {view.machine.model}
          </p>
        )}
        {view.notes && <p className="whitespace-pre-line">{view.notes}</p>}
        <p className="text-sm text-ink-soft">Printed from the catalogue as it stood on {new Date().toUTCString().slice(5, 16)}. Measure the old part before you order.</p>
      </header>
      <table className="sheet-table w-full border-collapse text-left text-sm">
        <thead>
          <tr className="border-b-2 border-ink">
            <th scope="col" className="py-1 pr-2">Factory number</th>
            <th scope="col" className="py-1 pr-2">Part</th>
            <th scope="col" className="py-1 pr-2">Order as</th>
            <th scope="col" className="py-1 pr-2">Sizes (mm)</th>
            <th scope="col" className="py-1 pr-2">Fit</th>
            <th scope="col" className="py-1 pr-2 text-right">Qty</th>
            <th scope="col" className="py-1">✓</th>
          </tr>
        </thead>
        <tbody>
          {view.lines.map((l) => (
            <tr key={l.id} className="border-b border-rule align-top" data-testid="sheet-line">
              <td className="num py-1 pr-2">
                {l.partId === null ? "—" : l.number}
                {l.requestedNumber && <span className="block whitespace-nowrap text-xs">was {l.requestedNumber}</span>}
              </td>
              <td className="py-1 pr-2">
                {l.description}
                <span className="block text-xs">{l.maker}</span>
                {l.notes && <span className="block text-xs italic">{l.notes}</span>}
              </td>
              <td className="num py-1 pr-2 font-bold">{l.chosen?.designation ?? "— no approved cross"}</td>
              <td className="num whitespace-nowrap py-1 pr-2">{l.chosen ? standardSizes(l.chosen).replace(" mm", "") : ""}</td>
              <td className="py-1 pr-2">{l.measured ? "measured" : l.chosen ? FIT_NAMES[l.chosen.fit].word : ""}</td>
              <td className="num py-1 pr-2 text-right font-bold">{l.quantity}</td>
              <td className="py-1">☐</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr>
            <td colSpan={5} className="py-1 pr-2 text-right">
              {view.totals.map((t) => `${t.name} ${t.quantity}`).join(" · ")}
            </td>
            <td className="num py-1 pr-2 text-right font-bold">{view.lines.reduce((s, l) => s + l.quantity, 0)}</td>
            <td />
          </tr>
        </tfoot>
      </table>
      {view.lines.some((l) => l.warnings.length > 0) && (
        <section className="text-sm">
          <h2 className="text-base font-bold">Check before ordering</h2>
          <ul className="list-disc pl-5">
            {view.lines
              .filter((l) => l.warnings.length > 0)
              .map((l) => (
                <li key={l.id}>
                  <span className="num">{l.number}</span>: {l.warnings.join(" ")}
                </li>
              ))}
          </ul>
        </section>
      )}
      {view.cautions.length > 0 && <Cautions kinds={view.cautions} />}
    </article>
  );
}
