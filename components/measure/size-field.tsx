"use client";

import { Field } from "@/components/ui/field";

/** One measured size, typed as people write it. Focusing it highlights the same dimension in the drawing. */
export function SizeField({
  onChange,
  unit,
  ...props
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
  return (
    <Field
      {...props}
      suffix={unit}
      mono
      onChange={(e) => onChange(e.target.value)}
      inputMode="text"
      autoComplete="off"
      spellCheck={false}
    />
  );
}
