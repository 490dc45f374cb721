import type { CautionKind } from "@/lib/catalogue/kinds";

const TEXT: Record<CautionKind, { title: string; points: string[] }> = {
  bearings: {
    title: "Pressing and heating bearings",
    points: [
      "Wear a face shield: a cocked bearing can shatter under the press.",
      "Press only on the ring with the tight fit: the inner ring onto a " +
        "shaft, the outer ring into a housing. Never through the balls.",
      "Heat a bearing with an induction heater or in an oven to at most about 120 °C, never with an open flame.",
    ],
  },
  belts: {
    title: "Belts, fans and pulleys",
    points: [
      "Engine stopped and key out before you measure, fit or tension a belt: " +
        "a turning belt draws fingers into the pulley.",
      "Put every guard back before the engine runs again.",
      "Stand clear of the fan when running a tensioned drive for the first time.",
    ],
  },
  coolant: {
    title: "Cooling systems",
    points: [
      "Never open a hot, pressurised cooling system: let it cool, then ease the cap off a quarter turn under a rag.",
    ],
  },
  seals: {
    title: "Fitting seals",
    points: [
      "Drive a seal in square with a driver that bears on its outer case, not the lip.",
      "Old seals and gaskets may contain asbestos: keep them wet, do not sand or blow them clean, and bag the waste.",
    ],
  },
  drivers: {
    title: "Drivers, punches and hammers",
    points: [
      "Wear safety glasses: a hardened punch or an old plug can throw chips when struck.",
      "Use a driver or punch with a clean, square face, and a hammer whose head is tight on its handle.",
      "Hold short parts in a vice or with a punch holder, not with your fingers.",
    ],
  },
  glands: {
    title: "Packing glands on a running pump",
    points: [
      "Adjust a gland only with the engine stopped, or with a long spanner from the side, well clear of the fan " +
        "and belt: sleeves, cuffs and rags wind onto a turning shaft.",
      "Let the engine cool before you open the cooling system: hot coolant under pressure scalds.",
    ],
  },
  chains: {
    title: "Chains and sprockets",
    points: [
      "Engine stopped and key out before you touch a chain: a chain drawn onto a sprocket takes fingers with it.",
      "Put every guard back before the engine runs again.",
      "Wear safety glasses when pressing out or peening chain pins: a pin or a clip can fly.",
    ],
  },
  grease: {
    title: "Grease guns",
    points: [
      "A grease gun makes enough pressure to force grease through skin: never hold a fitting, a nozzle or a hose " +
        "end in your fingers while pumping. An injection wound needs a hospital at once, even if it looks small.",
      "Wipe the fitting clean before you grease it, so dirt is not pumped into the bearing.",
    ],
  },
  gaskets: {
    title: "Old gaskets",
    points: [
      "Gaskets on machines of this age may contain asbestos. Wet the old gasket before scraping it off, never " +
        "sand, grind or blow it clean, wear a disposable respirator (FFP3 or P100), and bag the waste as your " +
        "local rules say.",
      "Cut new gaskets with a sharp knife drawn away from your hand, on a board; punch holes over end grain " +
        "or a lead block.",
    ],
  },
};

/** Short cautions for the work on the page; they defer to the maker's manual and local practice. */
export function Cautions({ kinds, compact = false }: { kinds: CautionKind[]; compact?: boolean }) {
  if (compact) {
    // On a printed sheet: the same words, set small, each kind on one line.
    return (
      <aside aria-labelledby="cautions-heading" className="rounded border-l-4 border-caution p-2 text-xs">
        <h2 id="cautions-heading" className="text-sm font-bold">
          Before you start
        </h2>
        {kinds.map((kind) => (
          <p key={kind}>
            <span className="font-bold">{TEXT[kind].title}.</span> {TEXT[kind].points.join(" ")}
          </p>
        ))}
        <p className="text-ink-soft">
          The maker&apos;s manual and your local rules come first; these notes do not replace them.
        </p>
      </aside>
    );
  }
  return (
    <aside aria-labelledby="cautions-heading" className="rounded-lg border-l-4 border-caution bg-ground-raised p-4">
      <h2 id="cautions-heading" className="mb-2 text-lg text-caution">
        Before you start
      </h2>
      <div className="space-y-3">
        {kinds.map((kind) => (
          <section key={kind}>
            <h3 className="font-bold">{TEXT[kind].title}</h3>
            <ul className="list-disc space-y-1 pl-5 text-ink-soft">
              {TEXT[kind].points.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          </section>
        ))}
        <p className="text-sm text-ink-soft">
          The maker&apos;s manual and your local rules come first; these notes do not replace them.
        </p>
      </div>
    </aside>
  );
}
