"use client";

import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { MatchBadge } from "@/components/lookup/match-badge";
import { CATEGORY_NAMES } from "@/lib/catalogue/kinds";
import { useLookup } from "@/lib/hooks/use-lookup";
import { Unbroken } from "@/components/ui/unbroken";

/**
 * The search box: suggestions appear as people type (arrow keys to move, Enter to open), and submitting opens the
 * full results page. Without scripts it is still a plain GET form to /lookup. What the page was opened with is not
 * asked for again: the server sent its results with the page.
 */
const LIST_CLASS = "absolute inset-x-0 top-full z-30 mt-1 rounded-lg border-2 border-ink/80 bg-ground-raised shadow-xl";

export function NumberSearch({
  defaultValue = "",
  autoFocus = false,
  makers = [],
  makerId = null,
}: {
  defaultValue?: string;
  autoFocus?: boolean;
  makers?: Array<{ id: number; name: string }>;
  makerId?: number | null;
}) {
  const router = useRouter();
  const [query, setQuery] = useState(defaultValue);
  const [typed, setTyped] = useState(false);
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(-1);
  const { results, isLoading, settled } = useLookup(typed ? query : "", 8, makerId);
  const listId = useId();
  const showList = open && query.trim() !== "";

  const go = (id: number) => router.push(`/parts/${id}`);

  return (
    <form
      action="/lookup"
      method="get"
      role="search"
      className="relative w-full"
      onSubmit={(e) => {
        if (active >= 0 && results[active]) {
          e.preventDefault();
          go(results[active].id);
        }
      }}
    >
      <label htmlFor="q" className="mb-2 block text-lg font-bold">
        Factory number from the old part or the parts book, or words
      </label>
      <div className="flex flex-col gap-2 sm:flex-row">
        {/* The suggestions open right under the box, over the button and the hint: on a phone's screen. */}
        <div className="relative flex flex-1">
          <input
            id="q"
            name="q"
            type="search"
            value={query}
            autoFocus={autoFocus}
            onChange={(e) => {
              setQuery(e.target.value);
              setTyped(true);
              setOpen(true);
              setActive(-1);
            }}
            onFocus={(e) => {
              setOpen(true);
              // On a phone the keyboard takes the lower half: bring the box to the top, the suggestions under it.
              if (window.innerWidth < 640) e.currentTarget.scrollIntoView({ block: "start", behavior: "smooth" });
            }}
            onBlur={() => setTimeout(() => setOpen(false), 150)}
            onKeyDown={(e) => {
              if (e.key === "ArrowDown") {
                e.preventDefault();
                setOpen(true);
                setActive((i) => Math.min(i + 1, results.length - 1));
              } else if (e.key === "ArrowUp") {
                e.preventDefault();
                setActive((i) => Math.max(i - 1, -1));
              } else if (e.key === "Escape") {
                setOpen(false);
              }
            }}
            required
            maxLength={120}
            autoComplete="off"
            spellCheck={false}
            placeholder="e.g. CV-3003-A"
            role="combobox"
            aria-expanded={showList}
            aria-controls={listId}
            aria-autocomplete="list"
            aria-activedescendant={active >= 0 ? `${listId}-${active}` : undefined}
            aria-describedby="q-hint"
            className={
              "min-h-14 w-full flex-1 rounded-md border-2 border-ink/70 bg-ground-raised " +
              "px-4 num text-xl tracking-wide focus:border-brass"
            }
          />
          {showList && (
            <div className={LIST_CLASS}>
              <ul
                id={listId}
                role="listbox"
                aria-label="Matching factory numbers"
                className="max-h-[min(24rem,55vh)] overflow-y-auto"
              >
                {results.map((r, i) => (
                  <li
                    key={r.id}
                    id={`${listId}-${i}`}
                    role="option"
                    aria-selected={i === active}
                    onMouseDown={(e) => e.preventDefault()}
                    onClick={() => go(r.id)}
                    className={
                      `cursor-pointer border-b border-rule px-4 py-3 last:border-b-0 ` +
                      `${i === active ? "bg-brass-wash" : "hover:bg-ground-sunk"}`
                    }
                  >
                    <span className="flex flex-wrap items-baseline gap-x-3">
                      <span className="num text-lg font-bold whitespace-nowrap">{r.number}</span>
                      <MatchBadge matchedBy={r.matchedBy} why={r.why} />
                    </span>
                    <span className="block text-sm text-ink-soft">
                      {r.maker} · {CATEGORY_NAMES[r.category]} · {r.description}
                      {r.latestNumber !== r.number && (
                        <>
                          {" "}
                          · <Unbroken text={`superseded by ${r.latestNumber}`} />
                        </>
                      )}
                    </span>
                  </li>
                ))}
              </ul>
              <p className="px-4 py-2 text-sm text-ink-soft" role="status">
                {isLoading
                  ? "Searching…"
                  : results.length === 0 && settled
                    ? `No factory number like “${settled}” yet. Try fewer characters, or measure the part.`
                    : `${results.length} shown. Enter for all results.`}
              </p>
            </div>
          )}
        </div>
        <button
          type="submit"
          className="min-h-14 rounded-md bg-ink px-6 text-lg font-bold text-ground hover:bg-ink-soft"
        >
          Find the standard part
        </button>
      </div>
      {makers.length > 0 && (
        <p className="mt-2 flex flex-wrap items-center gap-2">
          <label htmlFor="maker" className="text-sm">
            Maker
          </label>
          <select
            id="maker"
            name="maker"
            defaultValue={makerId ?? ""}
            onChange={(e) => {
              const form = e.currentTarget.form;
              if (form && query.trim()) form.requestSubmit();
            }}
            className="min-h-11 rounded-md border-2 border-rule-strong bg-ground-raised px-2"
          >
            <option value="">Any maker</option>
            {makers.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name}
              </option>
            ))}
          </select>
        </p>
      )}
      <p id="q-hint" className="mt-2 text-sm text-ink-soft">
        Type it as stamped: spaces, dashes and a worn character or two are fine. Part of a number, or words such as
        “water pump bearing model 22”, work too.
      </p>
    </form>
  );
}
