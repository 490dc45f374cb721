"use client";

/** One measured size. Focusing it highlights the same dimension in the drawing; the server's reason shows beneath. */
export function SizeField({
  id,
  label,
  hint,
  value,
  onChange,
  onFocus,
  error,
  unit,
  placeholder,
}: {
  id: string;
  label: string;
  hint?: string;
  value: string;
  onChange: (value: string) => void;
  onFocus?: () => void;
  error?: string;
  unit?: string;
  placeholder?: string;
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
          value={value}
          onChange={(e) => onChange(e.target.value)}
          onFocus={onFocus}
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          placeholder={placeholder}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          className={`num min-h-12 w-full rounded-l-md border-2 bg-ground-raised px-3 text-xl ${error ? "border-caution" : "border-rule-strong focus:border-brass"} ${unit ? "" : "rounded-r-md"}`}
        />
        {unit && (
          <span className="num flex items-center rounded-r-md border-2 border-l-0 border-rule-strong bg-ground-sunk px-3 text-ink-soft" aria-hidden="true">
            {unit}
          </span>
        )}
      </div>
      {error && (
        <p id={`${id}-error`} className="text-sm font-bold text-caution">
          {error}
        </p>
      )}
    </div>
  );
}
