"use client";

export function PrintButton() {
  return (
    <button
      type="button"
      onClick={() => window.print()}
      className="no-print inline-flex min-h-12 items-center rounded-md bg-brass px-5 font-bold text-white"
    >
      Print
    </button>
  );
}
