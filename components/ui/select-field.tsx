import type { SelectHTMLAttributes } from "react";
import { FieldError } from "@/components/ui/field";

/** A labelled list to choose from, with its error below; the twin of Field for <select>. */
export function SelectField({
  id,
  label,
  error,
  className = "",
  children,
  ...props
}: SelectHTMLAttributes<HTMLSelectElement> & { id: string; label: string; error?: string }) {
  return (
    <div className={`space-y-1 ${className}`}>
      <label htmlFor={id} className="block font-bold">
        {label}
      </label>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={
          `block min-h-12 w-full rounded-md border-2 bg-ground-raised px-3 py-2 ` +
          `text-lg ` +
          `${error ? "border-caution" : "border-rule-strong focus:border-brass"}`
        }
        {...props}
      >
        {children}
      </select>
      {error && <FieldError id={`${id}-error`}>{error}</FieldError>}
    </div>
  );
}
