import type { ReactNode } from "react";

type Tone = "info" | "success" | "caution";

// Drawn rather than typed: the text faces lack some symbol glyphs, and a shape reads in black-and-white print too.
const marks: Record<Tone, ReactNode> = {
  info: (
    <>
      <circle cx="10" cy="10" r="8" fill="none" stroke="currentColor" strokeWidth="2" />
      <path d="M10 9v5M10 6v.5" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />
    </>
  ),
  success: (
    <path
      d="M4 10.5l4 4 8-9"
      fill="none"
      stroke="currentColor"
      strokeWidth="2.6"
      strokeLinecap="round"
      strokeLinejoin="round"
    />
  ),
  caution: (
    <>
      <path d="M10 2.5l8.5 15h-17z" fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round" />
      <path d="M10 8v4.5M10 15v.5" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />
    </>
  ),
};

const tones: Record<Tone, { box: string; label: string }> = {
  info: { box: "border-rule-strong bg-ground-raised", label: "Note" },
  success: { box: "border-brass bg-brass-wash", label: "Done" },
  caution: { box: "border-caution bg-caution-wash text-ink", label: "Problem" },
};

/** A message box; the tone is carried by a drawn mark and a spoken word as well as the colour. */
export function Notice({
  tone = "info",
  children,
  role,
}: {
  tone?: Tone;
  children: ReactNode;
  role?: "alert" | "status";
}) {
  const t = tones[tone];
  return (
    <div role={role} className={`flex gap-3 rounded-md border-l-4 p-3 ${t.box}`}>
      <svg
        viewBox="0 0 20 20"
        className={`mt-1 h-5 w-5 shrink-0 ${tone === "caution" ? "text-caution" : "text-ink-soft"}`}
        aria-hidden="true"
      >
        {marks[tone]}
      </svg>
      <div>
        <span className="sr-only">{t.label}: </span>
        {children}
      </div>
    </div>
  );
}
