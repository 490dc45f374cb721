import { ConfirmButton } from "@/components/parts/confirm-button";
import { FitBadge } from "@/components/parts/fit-badge";
import { TemplateLinks } from "@/components/measure/template-links";
import type { CrossView } from "@/lib/catalogue/get-part";

/** What each size is called for a kind of standard part: a packing's width is its section, a gasket's its extent. */
const SIZE_NAMES: Partial<Record<string, [string, string, string, string]>> = {
  packing: ["inner", "outer", "section", "length"],
  plug: ["inner", "bore", "width", "length"],
  gasket: ["inner", "overall", "across", "length"],
  key: ["height", "diameter", "width", "length"],
  pin: ["small end", "large end", "width", "length"],
  thread: ["inner", "major diameter", "width", "length"],
  grease_fitting: ["inner", "thread", "width", "length"],
  chain: ["inner", "roller", "inner width", "length"],
};

const sizes = (s: NonNullable<CrossView["standard"]>) => {
  const [inner, outer, width, length] = SIZE_NAMES[s.kind] ?? ["inner", "outer", "width", "pitch length"];
  return [
    s.innerMm !== null && [inner, s.innerMm],
    s.outerMm !== null && [outer, s.outerMm],
    s.widthMm !== null && [width, s.widthMm],
    s.lengthMm !== null && [length, s.lengthMm],
  ].filter(Boolean) as Array<[string, number]>;
};

/** "3 members fitted this" / "size match only: not yet fitted by anyone". */
function sureness(cross: CrossView): string {
  if (cross.confirmations > 0)
    return `${cross.confirmations} ${cross.confirmations === 1 ? "member" : "members"} fitted this`;
  return cross.fit === "dimensions_only"
    ? "Size match only: not yet fitted by anyone"
    : "Not yet confirmed by a member";
}

export function CrossCard({ cross, signedIn = false }: { cross: CrossView; signedIn?: boolean }) {
  return (
    <article className="space-y-2 rounded-lg border-2 border-rule bg-ground-raised p-4" data-testid="cross">
      <div className="flex flex-wrap items-center gap-3">
        <FitBadge fit={cross.fit} />
        <span className="text-sm text-ink-soft">{sureness(cross)}</span>
      </div>
      {cross.standard && <p className="num text-2xl font-bold">{cross.standard.designation}</p>}
      {cross.viaNumber && (
        <p className="text-sm text-ink-soft" data-testid="via">
          Recorded on <span className="num font-bold whitespace-nowrap">{cross.viaNumber}</span>, a number of the same
          chain that fits here.
        </p>
      )}
      {cross.standard && sizes(cross.standard).length > 0 && (
        <p className="num text-ink-soft">
          {sizes(cross.standard)
            .map(([label, mm]) => `${label} ${mm} mm (${(mm / 25.4).toFixed(3)} in)`)
            .join(" · ")}
        </p>
      )}
      {typeof cross.standard?.attributes.template === "string" && (
        <TemplateLinks query={cross.standard.attributes.template} title={cross.standard.designation} />
      )}
      {cross.repairMethod && <p className={cross.standard ? "text-ink-soft" : "text-lg"}>{cross.repairMethod}</p>}
      {cross.notes && <p className="border-l-2 border-brass pl-2 text-sm whitespace-pre-line">{cross.notes}</p>}
      {cross.photos.length > 0 && (
        <ul className="flex flex-wrap gap-2" aria-label="Photos from the member who fitted it">
          {cross.photos.map((id) => (
            <li key={id}>
              <a href={`/api/photos/${id}`} target="_blank" rel="noreferrer">
                {/* eslint-disable-next-line @next/next/no-img-element -- photos come from the app's own route */}
                <img
                  src={`/api/photos/${id}`}
                  alt="Photo of the fitted part"
                  className="h-20 w-20 rounded border border-rule object-cover"
                />
              </a>
            </li>
          ))}
        </ul>
      )}
      <ConfirmButton crossId={cross.id} signedIn={signedIn} />
    </article>
  );
}
