import type { Metadata } from "next";
import Link from "next/link";
import { makersWithMachines } from "@/lib/catalogue/browse";

export const metadata: Metadata = { title: "Machines" };
export const dynamic = "force-dynamic";

export default async function MachinesPage() {
  const makers = await makersWithMachines();
  return (
    <div className="space-y-8">
      <div className="space-y-2">
        <h1 className="text-3xl">Machines</h1>
        <p className="max-w-3xl text-ink-soft">
          Browse by maker and model. Each machine lists its parts by assembly, with the standard part that takes each
          one&apos;s place.
        </p>
      </div>
      {makers.map((maker) => (
        <section key={maker.id} aria-labelledby={`maker-${maker.id}`} className="space-y-3">
          <h2 id={`maker-${maker.id}`} className="text-2xl">
            {maker.name}
          </h2>
          {maker.note && <p className="text-ink-soft">{maker.note}</p>}
          <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {maker.machines.map((m) => (
              <li key={m.id}>
                <Link
                  href={`/machines/${m.id}`}
                  className={
                    "block rounded-lg border-2 border-rule bg-ground-raised p-4 text-ink " +
                    "no-underline hover:border-brass"
                  }
                >
                  <span className="block text-lg font-bold">{m.model}</span>
                  <span className="block text-sm text-ink-soft">
                    {m.kind} · {m.years} · {m.partCount} parts
                  </span>
                </Link>
              </li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
