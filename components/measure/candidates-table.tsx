import type { Deviation } from "@/lib/standards/match";

export interface CandidateRow {
  key: string;
  name: string;
  detail?: string;
  score: number;
  deviations: Deviation[];
  warnings: string[];
}

/** How close a candidate is, in a word and a shape, so it reads without colour and in black-and-white print. */
function closeness(score: number): { mark: string; word: string } {
  if (score === 0) return { mark: "–", word: "Nearby only" };
  if (score >= 0.9) return { mark: "●", word: "Close" };
  if (score >= 0.7) return { mark: "◐", word: "Near" };
  return { mark: "○", word: "Possible" };
}

function signed(value: number): string {
  if (Math.abs(value) < 1e-9) return "±0";
  return `${value > 0 ? "+" : "−"}${Math.abs(value)}`;
}

export function CandidatesTable({
  title,
  caption,
  rows,
  unit,
  emptyText,
}: {
  title?: string;
  caption: string;
  rows: CandidateRow[];
  unit: string;
  emptyText: string;
}) {
  if (rows.length === 0)
    return <p className="rounded-md border border-rule bg-ground-raised p-4 text-ink-soft">{emptyText}</p>;
  return (
    <div className="space-y-2">
      {title && <h2 className="text-lg">{title}</h2>}
      <div className="overflow-x-auto rounded-lg border border-rule bg-ground-raised">
        {/* On a phone each row stacks into a card: name, match, then the sizes, with nothing off to the side. */}
        <table className="w-full border-collapse text-left max-sm:block">
          <caption className="sr-only">{caption}</caption>
          <thead className="bg-ground-sunk text-sm max-sm:hidden">
            <tr>
              <th scope="col" className="p-3">
                Standard part
              </th>
              <th scope="col" className="p-3">
                Match
              </th>
              <th scope="col" className="p-3">
                Sizes: nominal, and your reading against it ({unit})
              </th>
            </tr>
          </thead>
          <tbody className="max-sm:block">
            {rows.map((row) => {
              const c = closeness(row.score);
              return (
                <tr key={row.key} className="border-t border-rule align-top max-sm:block max-sm:first:border-t-0">
                  <th scope="row" className="p-3 max-sm:block max-sm:pb-1">
                    <span className="block num text-xl">{row.name}</span>
                    {row.detail && <span className="block text-sm font-normal text-ink-soft">{row.detail}</span>}
                  </th>
                  <td className="p-3 whitespace-nowrap max-sm:block max-sm:py-0">
                    <span aria-hidden="true" className="mr-1 text-brass">
                      {c.mark}
                    </span>
                    {c.word}
                    {row.score > 0 && (
                      <span className="block text-sm text-ink-faint max-sm:ml-2 max-sm:inline">
                        {Math.round(row.score * 100)} / 100
                      </span>
                    )}
                  </td>
                  <td className="p-3 max-sm:block">
                    <ul className="space-y-0.5">
                      {row.deviations.map((d) => (
                        <li key={d.name} className="num text-[0.95rem]">
                          {d.label} {d.nominalLabel}{" "}
                          <span className={d.withinTolerance ? "text-ink-soft" : "font-bold text-caution"}>
                            ({signed(d.deviation)})
                          </span>
                        </li>
                      ))}
                    </ul>
                    {row.warnings.length > 0 && (
                      <ul className="mt-2 space-y-1 text-sm">
                        {row.warnings.map((w) => (
                          <li key={w} className="border-l-2 border-brass pl-2">
                            {w}
                          </li>
                        ))}
                      </ul>
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
