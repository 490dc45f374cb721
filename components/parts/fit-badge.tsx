import { FIT_NAMES, type Fit } from "@/lib/catalogue/kinds";

/** Fit in a word and a shape, never by colour alone. */
export function FitBadge({ fit }: { fit: Fit }) {
  const f = FIT_NAMES[fit];
  return (
    <span
      className="inline-flex items-center gap-1 rounded-full border-2 border-ink/70 px-2.5 py-0.5 text-sm font-bold"
      title={f.text}
    >
      <span aria-hidden="true" className="text-brass">
        {f.mark}
      </span>
      {f.word}
    </span>
  );
}
