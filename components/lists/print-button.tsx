"use client";

export function PrintButton() {
  return (
    <button
      type="button"
      onClick={() => window.print()}
      className={
        "no-print inline-flex min-h-12 items-center rounded-md bg-ink px-5 " + "font-bold text-ground hover:bg-ink-soft"
      }
    >
      Print
    </button>
  );
}
