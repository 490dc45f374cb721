export function SiteFooter() {
  return (
    <footer className="no-print mt-12 border-t border-rule bg-ground-sunk">
      <div className="mx-auto grid max-w-5xl gap-6 px-4 py-8 text-sm text-ink-soft sm:grid-cols-[2fr_1fr] sm:px-6">
        <section aria-labelledby="safety-heading" className="rounded-lg border-l-4 border-caution bg-ground-raised p-4">
          <h2 id="safety-heading" className="mb-1 text-base text-caution">
            Work safely
          </h2>
          <p>
            A cross tells you which standard part has the same size; it does not tell you how to fit it. Pressing
            bearings, spinning belts and fans, hot coolant under pressure and old gaskets that may contain asbestos can
            all hurt you. Follow the maker&apos;s manual, your local rules and a qualified mechanic&apos;s practice.
            Engine stopped, key out, machine on stands before you reach in.
          </p>
        </section>
        <div>
          <p className="font-bold text-ink">Understudy</p>
          <p>
            A members&apos; catalogue of standard parts that take the place of obsolete factory numbers. Every cross
            says how sure it is; none is guaranteed.
          </p>
        </div>
      </div>
    </footer>
  );
}
