"use client";

import type { ReactNode } from "react";
import { Field } from "@/components/ui/field";

/** "Have the number? Read it": a part number field and what the engine reads from it, above the measuring panel. */
export function NumberDecode({
  id,
  heading,
  label,
  hint,
  placeholder,
  value,
  onChange,
  error,
  children,
}: {
  id: string;
  heading: string;
  label: string;
  hint: string;
  placeholder: string;
  value: string;
  onChange: (value: string) => void;
  error?: string;
  children?: ReactNode;
}) {
  return (
    <section aria-labelledby={`${id}-heading`} className="space-y-3">
      <h2 id={`${id}-heading`} className="text-2xl">
        {heading}
      </h2>
      <div className="max-w-md">
        <Field
          id={id}
          label={label}
          hint={hint}
          mono
          value={value}
          onChange={(e) => onChange(e.target.value)}
          error={error}
          placeholder={placeholder}
          autoComplete="off"
          spellCheck={false}
        />
      </div>
      {children}
    </section>
  );
}
