import { FitBadge } from "@/components/parts/fit-badge";
import type { CrossView } from "@/lib/catalogue/get-part";

const sizes = (s: NonNullable<CrossView["standard"]>) =>
  [
    s.innerMm !== null && ["inner", s.innerMm],
    s.outerMm !== null && ["outer", s.outerMm],
    s.widthMm !== null && ["width", s.widthMm],
    s.lengthMm !== null && ["pitch length", s.lengthMm],
  ].filter(Boolean) as Array<[string, number]>;

/** "3 members fitted this" / "size match only: not yet fitted by anyone". */
function sureness(cross: CrossView): string {
  if (cross.confirmations > 0) return `${cross.confirmations} ${cross.confirmations === 1 ? "member" : "members"} fitted this`;
  return cross.fit === "dimensions_only" ? "Size match only: not yet fitted by anyone" : "Not yet confirmed by a member";
}

export function CrossCard({ cross }: { cross: CrossView }) {
  return (
    <article className="space-y-2 rounded-lg border-2 border-rule bg-ground-raised p-4" data-testid="cross">
      <div className="flex flex-wrap items-center gap-3">
        <FitBadge fit={cross.fit} />
        <span className="text-sm text-ink-soft">{sureness(cross)}</span>
      </div>
      {cross.standard && <p className="num text-2xl font-bold">{cross.standard.designation}</p>}
      {cross.standard && sizes(cross.standard).length > 0 && (
        <p className="num text-ink-soft">
          {sizes(cross.standard)
            .map(([label, mm]) => `${label} ${mm} mm (${(mm / 25.4).toFixed(3)} in)`)
            .join(" · ")}
        </p>
      )}
      {cross.repairMethod && <p className={cross.standard ? "text-ink-soft" : "text-lg"}>{cross.repairMethod}</p>}
      {cross.notes && <p className="border-l-2 border-brass pl-2 text-sm">{cross.notes}</p>}
    </article>
  );
}
