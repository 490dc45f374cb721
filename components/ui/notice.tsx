import type { ReactNode } from "react";

type Tone = "info" | "success" | "caution";

const tones: Record<Tone, { box: string; mark: string; label: string }> = {
  info: { box: "border-rule-strong bg-ground-raised", mark: "ⓘ", label: "Note" },
  success: { box: "border-brass bg-brass-wash", mark: "✓", label: "Done" },
  caution: { box: "border-caution bg-caution-wash", mark: "!", label: "Problem" },
};

/** A message box; the tone is carried by a mark and a word as well as the colour. */
export function Notice({ tone = "info", children, role }: { tone?: Tone; children: ReactNode; role?: "alert" | "status" }) {
  const t = tones[tone];
  return (
    <div role={role} className={`flex gap-3 rounded-md border-l-4 p-3 ${t.box}`}>
      <span aria-hidden="true" className="font-bold">{t.mark}</span>
      <div>
        <span className="sr-only">{t.label}: </span>
        {children}
      </div>
    </div>
  );
}
