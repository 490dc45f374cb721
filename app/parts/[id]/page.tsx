import type { Metadata } from "next";
import Link from "next/link";
import { Cautions } from "@/components/safety/cautions";
import { BearingDrawing } from "@/components/measure/bearing-drawing";
import { BeltDrawing } from "@/components/measure/belt-drawing";
import { SealDrawing } from "@/components/measure/seal-drawing";
import { CrossCard } from "@/components/parts/cross-card";
import { AddToList } from "@/components/lists/add-to-list";
import { Notice } from "@/components/ui/notice";
import { getPart, type PartDetail } from "@/lib/catalogue/get-part";
import { CATEGORY_NAMES } from "@/lib/catalogue/kinds";
import { loadByIdOr404 } from "@/lib/http/load-or-404";
import { getCurrentSession } from "@/lib/auth/session";
import { KeepPart } from "@/components/parts/keep-part";
import { FIT_NAMES } from "@/lib/catalogue/kinds";
import { crossLabel } from "@/lib/catalogue/ranking";
import { standardSizes } from "@/lib/catalogue/sizes";

const load = (idText: string): Promise<PartDetail> => loadByIdOr404(idText, getPart);

export async function generateMetadata({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> {
  const part = await load((await params).id);
  return { title: `${part.number}, ${part.description}` };
}

const KIND_WORDS = {
  interchangeable: "interchangeable",
  one_way: "one way only",
  with_companions: "needs companion parts",
} as const;

function Drawing({ part }: { part: PartDetail }) {
  if (part.category === "bearing") return <BearingDrawing active={null} />;
  if (part.category === "lip_seal") return <SealDrawing active={null} />;
  if (part.category === "v_belt") return <BeltDrawing active={null} />;
  return null;
}

export default async function PartPage({ params }: { params: Promise<{ id: string }> }) {
  const part = await load((await params).id);
  const { user } = await getCurrentSession();
  const chain = [
    ...part.chain.before,
    { id: part.id, number: part.number, kind: null, note: null },
    ...part.chain.after,
  ];
  const dims = part.dimensions;
  const documented = [
    dims.innerMm !== null && `${part.category === "lip_seal" ? "shaft" : "bore"} ${dims.innerMm} mm`,
    dims.outerMm !== null && `${part.category === "lip_seal" ? "housing bore" : "outside"} ${dims.outerMm} mm`,
    dims.widthMm !== null && `${part.category === "v_belt" ? "top width" : "width"} ${dims.widthMm} mm`,
    dims.lengthMm !== null && `inside length ${dims.lengthMm} mm`,
  ].filter(Boolean);

  return (
    <div className="space-y-10">
      <header className="space-y-2">
        <p className="text-ink-soft">
          {part.maker.name} · {CATEGORY_NAMES[part.category]}
        </p>
        <h1 className="num text-4xl">{part.number}</h1>
        <p className="text-xl">{part.description}</p>
        <KeepPart
          part={{
            id: part.id,
            number: part.number,
            maker: part.maker.name,
            categoryName: CATEGORY_NAMES[part.category],
            description: part.description,
            equivalents: part.crosses.map((c) => ({
              designation: crossLabel(c),
              sizes: c.standard ? standardSizes(c.standard) : "",
              fit: FIT_NAMES[c.fit].word,
            })),
          }}
        />
        {user && (
          <div className="no-print">
            <AddToList item={{ partId: part.id }} number={part.number} />
          </div>
        )}
        {part.chain.latest.id !== part.id && (
          <Notice>
            Superseded. The latest number is{" "}
            <Link href={`/parts/${part.chain.latest.id}`} className="num font-bold">
              {part.chain.latest.number}
            </Link>
            ; its page may list more crosses.
          </Notice>
        )}
      </header>

      <section aria-labelledby="equivalents-heading" className="space-y-3">
        <h2 id="equivalents-heading" className="text-2xl">
          Standard equivalents
        </h2>
        {part.crosses.length === 0 ? (
          <Notice>No approved cross for this number yet. If you have fitted one, propose it below.</Notice>
        ) : (
          <div className="grid gap-3 md:grid-cols-2">
            {part.crosses.map((c) => (
              <CrossCard key={c.id} cross={c} signedIn={Boolean(user)} />
            ))}
          </div>
        )}
        <p className="text-sm text-ink-soft">
          Ranked by fit, then by how many members fitted each, counting the numbers this one is interchangeable with and
          any newer number that replaces it. None is guaranteed: measure before you order.
        </p>
        <p>
          <Link href={`/propose?part=${part.id}`}>Fitted something else that works? Propose a cross for this part</Link>
        </p>
      </section>

      {(documented.length > 0 || ["bearing", "lip_seal", "v_belt"].includes(part.category)) && (
        <section aria-labelledby="size-heading" className="grid gap-4 md:grid-cols-[1fr_18rem]">
          <div className="space-y-2">
            <h2 id="size-heading" className="text-2xl">
              Size as the maker specified it
            </h2>
            {documented.length > 0 ? (
              <p className="num text-lg">{documented.join(" · ")}</p>
            ) : (
              <p className="text-ink-soft">Not documented.</p>
            )}
            {dims.note && <p className="text-ink-soft">{dims.note}</p>}
          </div>
          <figure className="rounded-lg border border-rule bg-ground-raised p-3">
            <Drawing part={part} />
          </figure>
        </section>
      )}

      {chain.length > 1 && (
        <section aria-labelledby="chain-heading" className="space-y-3">
          <h2 id="chain-heading" className="text-2xl">
            Supersessions
          </h2>
          <ol className="space-y-2">
            {chain.map((link, i) => (
              <li key={link.id} className="flex flex-wrap items-baseline gap-x-3">
                <span className="text-ink-faint">{i === 0 ? "first" : "then"}</span>
                {link.id === part.id ? (
                  <span className="num text-lg font-bold" aria-current="true">
                    {link.number} (this part)
                  </span>
                ) : (
                  <Link href={`/parts/${link.id}`} className="num text-lg">
                    {link.number}
                  </Link>
                )}
                {link.kind && <span className="text-sm text-ink-soft">{KIND_WORDS[link.kind]}</span>}
                {link.note && <span className="text-sm">{link.note}</span>}
              </li>
            ))}
          </ol>
          {part.chain.loop && (
            <Notice tone="caution">
              The records point back on themselves somewhere in this chain; it is shown up to the loop.
            </Notice>
          )}
        </section>
      )}

      <section aria-labelledby="used-heading" className="space-y-3">
        <h2 id="used-heading" className="text-2xl">
          Where it is used
        </h2>
        <p className="text-ink-soft">
          Every machine that shares this part: donors to look for, and other owners who need the same cross.
        </p>
        <div className="overflow-x-auto rounded-lg border border-rule bg-ground-raised">
          <table className="w-full text-left">
            <thead className="bg-ground-sunk text-sm">
              <tr>
                <th scope="col" className="p-3">
                  Machine
                </th>
                <th scope="col" className="p-3">
                  Where on it
                </th>
                <th scope="col" className="p-3">
                  Qty
                </th>
                <th scope="col" className="p-3">
                  Serial numbers
                </th>
              </tr>
            </thead>
            <tbody>
              {part.whereUsed.map((u) => (
                <tr key={`${u.machineId}-${u.assembly}-${u.serials}`} className="border-t border-rule">
                  <td className="p-3">
                    <Link href={`/machines/${u.machineId}`}>
                      {u.maker} {u.model}
                    </Link>{" "}
                    <span className="text-sm text-ink-soft">{u.years}</span>
                  </td>
                  <td className="p-3">
                    {u.assembly}
                    {u.position !== part.description && (
                      <span className="block text-sm text-ink-soft">{u.position}</span>
                    )}
                  </td>
                  <td className="p-3 num">{u.quantity}</td>
                  <td className="p-3 text-sm">
                    <span className="num">{u.serials ?? "all"}</span>
                    {u.serialNote && <span className="block text-ink-soft">{u.serialNote}</span>}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      {part.sameAssembly.length > 0 && (
        <section aria-labelledby="rest-heading" className="space-y-3">
          <h2 id="rest-heading" className="text-2xl">
            The rest of the assembly
          </h2>
          <p className="text-ink-soft">Parts fitted beside this one: what else to order for the same rebuild.</p>
          <ul className="grid gap-2 sm:grid-cols-2">
            {part.sameAssembly.map((p) => (
              <li key={p.id} className="rounded-md border border-rule bg-ground-raised p-3">
                <Link href={`/parts/${p.id}`} className="num font-bold">
                  {p.number}
                </Link>
                <span className="block text-sm text-ink-soft">
                  {p.description} · {p.model}, {p.assembly.toLowerCase()}
                  {p.serials && `, ${p.serials}`}
                </span>
                {p.standard && <span className="block num text-sm">→ {p.standard}</span>}
              </li>
            ))}
          </ul>
        </section>
      )}

      {part.cautions.length > 0 && <Cautions kinds={part.cautions} />}
    </div>
  );
}
