import type { InputHTMLAttributes, ReactNode } from "react";

/**
 * A labelled input whose hint and error are tied to it by aria-describedby, so screen readers read all three.
 * `suffix` shows a unit beside the box; `mono` sets the value in the monospace face, for sizes and numbers.
 */
export function Field({
  id,
  label,
  hint,
  error,
  suffix,
  mono = false,
  ...input
}: InputHTMLAttributes<HTMLInputElement> & {
  id: string;
  label: string;
  hint?: ReactNode;
  error?: string;
  suffix?: string;
  mono?: boolean;
}) {
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
      <div className="flex items-stretch">
        <input
          id={id}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          className={`block min-h-12 w-full border-2 bg-ground-raised px-3 py-2 ${mono ? "num text-xl" : "text-lg"} ${
            error ? "border-caution" : "border-rule-strong focus:border-brass"
          } ${suffix ? "rounded-l-md" : "rounded-md"}`}
          {...input}
        />
        {suffix && (
          <span
            className={
              "flex items-center rounded-r-md border-2 border-l-0 border-rule-strong " +
              "bg-ground-sunk px-3 num text-ink-soft"
            }
            aria-hidden="true"
          >
            {suffix}
          </span>
        )}
      </div>
      {error && <FieldError id={`${id}-error`}>{error}</FieldError>}
    </div>
  );
}

/** Why a field's value was refused, under the field; give the field aria-describedby={id} so it is read out. */
export function FieldError({ id, children }: { id: string; children: ReactNode }) {
  return (
    <p id={id} className="text-sm font-bold text-caution">
      <span aria-hidden="true">✕ </span>
      {children}
    </p>
  );
}
