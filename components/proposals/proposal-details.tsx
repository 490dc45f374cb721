import Link from "next/link";
import { TemplateLinks } from "@/components/measure/template-links";
import { FitBadge } from "@/components/parts/fit-badge";
import { Notice } from "@/components/ui/notice";
import { CATEGORY_NAMES, STANDARD_KIND_NAMES } from "@/lib/catalogue/kinds";
import { standardSizes } from "@/lib/catalogue/sizes";
import { MEASURED_NAMES } from "@/lib/proposals/kinds";
import type { ProposalDetail } from "@/lib/proposals/views";

const mm = (v: number) => `${v.toFixed(3).replace(/\.?0+$/, "")} mm`;

function deviationWord(d: number): string {
  const a = Math.abs(d);
  if (a <= 0.05) return "agrees";
  if (a <= 0.3) return "worn or within tolerance";
  return "does not match";
}

/**
 * A proposal as sent: the parts, fit, notes, the engine's checks, the measurements against the standard part, the
 * photos.
 */
export function ProposalDetails({ detail: d }: { detail: ProposalDetail }) {
  return (
    <section aria-labelledby="proposal-heading" className="space-y-4">
      <h2 id="proposal-heading" className="text-2xl">
        The proposal
      </h2>
      <dl className="divide-y divide-rule rounded-lg border border-rule bg-ground-raised">
        <div className="grid gap-1 p-3 sm:grid-cols-[9rem_1fr]">
          <dt className="font-bold">Worn part</dt>
          <dd>
            <span className="num font-bold">{d.part.number}</span> · {d.part.maker} · {CATEGORY_NAMES[d.part.category]}
            <span className="block">{d.part.description}</span>
            {d.part.isNew ? (
              <span className="block text-sm font-bold text-caution">
                New to the catalogue: approving adds it
                {d.part.machine ? ` to the ${d.part.machine}, ${d.part.assembly}` : ""}.
              </span>
            ) : (
              <Link href={`/parts/${d.part.id}`} className="text-sm">
                Its part page
              </Link>
            )}
          </dd>
        </div>
        <div className="grid gap-1 p-3 sm:grid-cols-[9rem_1fr]">
          <dt className="font-bold">Standard part</dt>
          <dd>
            <span className="num font-bold">{d.standardPart.designation}</span> ·{" "}
            {STANDARD_KIND_NAMES[d.standardPart.kind]}
            <span className="block num">{standardSizes(d.standardPart) || "no sizes given"}</span>
            {d.standardPart.template && (
              <TemplateLinks query={d.standardPart.template} title={d.standardPart.designation} />
            )}
            {d.standardPart.isNew && (
              <span className="block text-sm font-bold text-caution">
                New to the catalogue: approving adds it with these sizes.
              </span>
            )}
          </dd>
        </div>
        <div className="grid gap-1 p-3 sm:grid-cols-[9rem_1fr]">
          <dt className="font-bold">Fit</dt>
          <dd>
            <FitBadge fit={d.fit} />
          </dd>
        </div>
        <div className="grid gap-1 p-3 sm:grid-cols-[9rem_1fr]">
          <dt className="font-bold">Notes</dt>
          <dd className="whitespace-pre-line">{d.notes || <span className="text-ink-soft">none</span>}</dd>
        </div>
      </dl>

      {d.checks.length > 0 && (
        <div className="space-y-2">
          <h3 className="text-lg">What the standards engine found</h3>
          <ul className="space-y-2">
            {d.checks.map((c) => (
              <li key={c.message}>
                <Notice tone={c.level === "warning" ? "caution" : "success"}>{c.message}</Notice>
              </li>
            ))}
          </ul>
        </div>
      )}

      <div className="space-y-2">
        <h3 className="text-lg">Measured on the old part</h3>
        {d.measurements.length === 0 ? (
          <p className="text-ink-soft">Nothing measured was given.</p>
        ) : (
          <div className="overflow-x-auto rounded-lg border border-rule bg-ground-raised">
            <table className="w-full text-left">
              <thead className="bg-ground-sunk text-sm">
                <tr>
                  <th scope="col" className="p-3">
                    Size
                  </th>
                  <th scope="col" className="p-3">
                    Measured
                  </th>
                  <th scope="col" className="p-3">
                    Standard part
                  </th>
                  <th scope="col" className="p-3">
                    Difference
                  </th>
                </tr>
              </thead>
              <tbody>
                {d.measurements.map((m, i) => {
                  const dev = d.deviations.find(
                    (x) => x.dimension === m.dimension && x.label === (m.label || m.dimension),
                  );
                  return (
                    <tr key={i} className="border-t border-rule" data-testid="measurement">
                      <td className="p-3">{m.label || MEASURED_NAMES[m.dimension]}</td>
                      <td className="p-3 num">
                        {m.value} {m.unit}
                        {m.unit === "in" && <span className="block text-sm text-ink-soft">{mm(m.value * 25.4)}</span>}
                      </td>
                      <td className="p-3 num">{dev ? mm(dev.nominalMm) : "—"}</td>
                      <td className="p-3">
                        {dev ? (
                          <>
                            <span className="num">
                              {dev.deviationMm > 0 ? "+" : ""}
                              {mm(dev.deviationMm)}
                            </span>
                            <span
                              className={
                                `block text-sm ` +
                                `${Math.abs(dev.deviationMm) > 0.3 ? "font-bold text-caution" : "text-ink-soft"}`
                              }
                            >
                              {deviationWord(dev.deviationMm)}
                            </span>
                          </>
                        ) : (
                          "—"
                        )}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        )}
        <p className="text-sm text-ink-soft">
          Within 0.05 mm: agrees. Up to 0.3 mm: usual wear on a shaft or bore. Common practice (no published source).
        </p>
      </div>

      <div className="space-y-2">
        <h3 className="text-lg">Photos</h3>
        {d.photoList.length === 0 ? (
          <p className="text-ink-soft">No photos.</p>
        ) : (
          <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3">
            {d.photoList.map((p) => (
              <li key={p.id}>
                <a href={p.url} target="_blank" rel="noreferrer">
                  {/* eslint-disable-next-line @next/next/no-img-element -- the app's own route, checked per viewer */}
                  <img
                    src={p.url}
                    alt={p.fileName ?? `Photo ${p.id}`}
                    className="aspect-square w-full rounded-md border border-rule object-cover"
                    data-testid="review-photo"
                  />
                </a>
              </li>
            ))}
          </ul>
        )}
      </div>
    </section>
  );
}
