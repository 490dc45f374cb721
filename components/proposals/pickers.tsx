"use client";

import { useId, useState } from "react";
import { FieldError } from "@/components/ui/field";
import type { StandardPartHit } from "@/lib/catalogue/find-standard";
import { CATEGORY_NAMES, type StandardKind } from "@/lib/catalogue/kinds";
import { useStandardParts } from "@/lib/hooks/use-lookup";
import { useLookup } from "@/lib/hooks/use-lookup";
import { standardSizes } from "@/lib/catalogue/sizes";
import type { StandardDims } from "@/lib/proposals/checks";

export interface PickedPart {
  id: number;
  number: string;
  maker: string;
  description: string;
  /** Documented sizes in mm, to compare a proposed standard part with before sending. */
  dims?: StandardDims;
}

export interface PickedStandard {
  id: number;
  designation: string;
  sizes: string;
  kind?: StandardKind;
  dims?: StandardDims;
}

function Picked({ title, detail, onClear }: { title: string; detail: string; onClear: () => void }) {
  return (
    <div
      className="flex flex-wrap items-center justify-between gap-3 rounded-md border-2 border-brass bg-brass-wash p-3"
      data-testid="picked"
    >
      <div>
        <p className="num text-xl font-bold">{title}</p>
        <p className="text-sm">{detail}</p>
      </div>
      <button type="button" className="underline" onClick={onClear}>
        Choose another
      </button>
    </div>
  );
}

function SearchBox({
  id,
  label,
  hint,
  value,
  onChange,
  error,
}: {
  id: string;
  label: string;
  hint: string;
  value: string;
  onChange: (v: string) => void;
  error?: string;
}) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block font-bold">
        {label}
      </label>
      <p id={`${id}-hint`} className="text-sm text-ink-soft">
        {hint}
      </p>
      <input
        id={id}
        type="search"
        aria-describedby={error ? `${id}-hint ${id}-error` : `${id}-hint`}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        autoComplete="off"
        aria-invalid={error ? true : undefined}
        className={
          `block min-h-12 w-full rounded-md border-2 bg-ground-raised px-3 py-2 ` +
          `num text-lg ` +
          `${error ? "border-caution" : "border-rule-strong focus:border-brass"}`
        }
      />
      {error && <FieldError id={`${id}-error`}>{error}</FieldError>}
    </div>
  );
}

/** Finds the worn part by its factory number, the same way the look-up does. */
export function PartPicker({
  picked,
  onPick,
  error,
}: {
  picked: PickedPart | null;
  onPick: (p: PickedPart | null) => void;
  error?: string;
}) {
  const [query, setQuery] = useState("");
  const { results, isLoading } = useLookup(query, 6);
  const id = useId();
  if (picked)
    return (
      <Picked title={picked.number} detail={`${picked.maker} · ${picked.description}`} onClear={() => onPick(null)} />
    );
  return (
    <div className="space-y-2">
      <SearchBox
        id={id}
        label="Factory number"
        hint="As stamped or as in the parts book; spaces, dashes and worn characters are fine."
        value={query}
        onChange={setQuery}
        error={error}
      />
      {query.trim() && (
        <ul className="divide-y divide-rule rounded-md border border-rule bg-ground-raised" aria-label="Parts found">
          {isLoading && results.length === 0 && <li className="p-3 text-ink-soft">Looking…</li>}
          {!isLoading && results.length === 0 && (
            <li className="p-3 text-ink-soft">
              No part with a number like that. Choose “not in the catalogue yet” above.
            </li>
          )}
          {results.map((r) => (
            <li key={r.id}>
              <button
                type="button"
                className="flex w-full flex-wrap items-baseline gap-x-3 p-3 text-left hover:bg-ground-sunk"
                onClick={() =>
                  onPick({ id: r.id, number: r.number, maker: r.maker, description: r.description, dims: r.sizes })
                }
              >
                <span className="num text-lg font-bold whitespace-nowrap">{r.number}</span>
                <span>{r.description}</span>
                <span className="text-sm text-ink-soft">
                  {r.maker} · {CATEGORY_NAMES[r.category]}
                </span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

/** Finds a standard part already in the catalogue by its designation. */
export function StandardPicker({
  picked,
  onPick,
  kind,
  error,
}: {
  picked: PickedStandard | null;
  onPick: (p: PickedStandard | null) => void;
  kind?: StandardKind;
  error?: string;
}) {
  const [query, setQuery] = useState("");
  const { results, isLoading, settled } = useStandardParts<StandardPartHit>(query, kind);
  const id = useId();
  if (picked) return <Picked title={picked.designation} detail={picked.sizes} onClear={() => onPick(null)} />;
  return (
    <div className="space-y-2">
      <SearchBox
        id={id}
        label="Designation"
        hint="For example 6205-2RS, 32 × 47 or B43."
        value={query}
        onChange={setQuery}
        error={error}
      />
      {settled && (
        <ul
          className="divide-y divide-rule rounded-md border border-rule bg-ground-raised"
          aria-label="Standard parts found"
        >
          {isLoading && <li className="p-3 text-ink-soft">Looking…</li>}
          {!isLoading && results.length === 0 && (
            <li className="p-3 text-ink-soft">Not in the catalogue. Choose “enter it by designation” above.</li>
          )}
          {results.map((r) => (
            <li key={r.id}>
              <button
                type="button"
                className="flex w-full flex-wrap items-baseline gap-x-3 p-3 text-left hover:bg-ground-sunk"
                onClick={() =>
                  onPick({
                    id: r.id,
                    designation: r.designation,
                    sizes: standardSizes(r),
                    kind: r.kind,
                    dims: { innerMm: r.innerMm, outerMm: r.outerMm, widthMm: r.widthMm, lengthMm: r.lengthMm },
                  })
                }
              >
                <span className="num text-lg font-bold">{r.designation}</span>
                <span className="text-sm text-ink-soft">{standardSizes(r)}</span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
