import type { InputHTMLAttributes, ReactNode } from "react";

/** A labelled input whose error message is tied to it by aria-describedby, so screen readers read both. */
export function Field({
  id,
  label,
  hint,
  error,
  ...input
}: InputHTMLAttributes<HTMLInputElement> & { id: string; label: string; hint?: ReactNode; error?: string }) {
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block font-bold">
        {label}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`block min-h-12 w-full rounded-md border-2 bg-ground-raised px-3 py-2 text-lg ${
          error ? "border-caution" : "border-rule-strong focus:border-brass"
        }`}
        {...input}
      />
      {error && (
        <p id={`${id}-error`} className="text-sm font-bold text-caution">
          <span aria-hidden="true">✕ </span>
          {error}
        </p>
      )}
    </div>
  );
}
