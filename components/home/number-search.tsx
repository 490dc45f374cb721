/** The factory-number search box. A plain GET form, so it works before scripts load and gives a shareable URL. */
export function NumberSearch({ defaultValue = "" }: { defaultValue?: string }) {
  return (
    <form action="/lookup" method="get" role="search" className="w-full">
      <label htmlFor="q" className="mb-2 block text-lg font-bold">
        Factory number from the old part or the parts book
      </label>
      <div className="flex flex-col gap-2 sm:flex-row">
        <input
          id="q"
          name="q"
          type="search"
          defaultValue={defaultValue}
          required
          maxLength={60}
          autoComplete="off"
          spellCheck={false}
          placeholder="e.g. 7H-2214 B"
          aria-describedby="q-hint"
          className="num min-h-14 flex-1 rounded-md border-2 border-ink/70 bg-ground-raised px-4 text-xl tracking-wide focus:border-brass"
        />
        <button type="submit" className="min-h-14 rounded-md bg-brass px-6 text-lg font-bold text-white hover:bg-brass-deep">
          Find the standard part
        </button>
      </div>
      <p id="q-hint" className="mt-2 text-sm text-ink-soft">
        Type it as stamped: spaces, dashes and a worn character or two are fine.
      </p>
    </form>
  );
}
