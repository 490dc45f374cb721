"use client";

import { useState, type ReactNode } from "react";

/**
 * The answer to take to the parts counter, first and big: what to ask for, in the system the part was made to, with a
 * button that copies it for a message or an order form.
 */
export function OrderCard({
  title,
  label,
  details,
  notes,
  source,
  children,
}: {
  title: string;
  label: string;
  details?: ReactNode;
  notes: string[];
  source?: string;
  children?: ReactNode;
}) {
  const [copied, setCopied] = useState(false);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(label);
      setCopied(true);
      setTimeout(() => setCopied(false), 2000);
    } catch {
      setCopied(false);
    }
  };
  return (
    <section
      aria-labelledby="order-heading"
      className="space-y-3 rounded-lg border-2 border-ink/80 bg-ground-raised p-4"
      data-testid="order"
    >
      <h2 id="order-heading" className="text-lg">
        {title}
      </h2>
      <div className="flex flex-wrap items-center gap-3">
        <p
          className={`num font-bold break-words ${label.length > 32 ? "text-xl sm:text-2xl" : "text-3xl sm:text-4xl"}`}
          data-testid="order-label"
        >
          {label}
        </p>
        <button
          type="button"
          onClick={() => void copy()}
          className="min-h-11 rounded-md border-2 border-ink/80 px-3 text-sm font-bold hover:bg-ground-sunk"
        >
          {copied ? "Copied" : "Copy"}
        </button>
        <span className="sr-only" role="status">
          {copied ? "Copied to the clipboard" : ""}
        </span>
      </div>
      {details}
      {notes.length > 0 && (
        <ul className="space-y-1 text-[0.95rem]">
          {notes.map((n) => (
            <li key={n} className="border-l-2 border-brass pl-2">
              {n}
            </li>
          ))}
        </ul>
      )}
      {source && <p className="text-sm text-ink-soft">Source: {source}.</p>}
      {children}
    </section>
  );
}
