import Link from "next/link";
import { NumberSearch } from "@/components/lookup/number-search";
import { Notice } from "@/components/ui/notice";

const jobs: Array<{ title: string; text: string; href?: string; action?: string }> = [
  {
    title: "Look up a factory number",
    text:
      "Type the number stamped on the worn part. See the standard bearing, " +
      "seal or belt that replaces it, how sure the catalogue is, and which " +
      "other machines share it.",
    href: "/machines",
    action: "Or browse the parts of a machine",
  },
  {
    title: "Measure a part with no number",
    text:
      "Enter what the calipers read, in inches or millimetres. Get the " +
      "standard sizes it is likely to be, with the inch-and-metric near " +
      "misses spelled out.",
    href: "/measure/bearing",
    action: "Measure a bearing, seal, belt, key, thread…",
  },
  {
    title: "Share what you fitted",
    text:
      "Propose a cross with your measurements and photos. A moderator checks " +
      "it before anyone else relies on it, and you hear back by e-mail.",
    href: "/propose",
    action: "Propose a cross",
  },
  {
    title: "Order the whole job",
    text: "Gather every part of a rebuild in a job list, then print it or export it to order by standard numbers.",
    href: "/lists",
    action: "Start a job list",
  },
];

const fits = [
  { mark: "●", word: "Direct", text: "same size and type; fits as the old part did" },
  { mark: "◐", word: "With modification", text: "fits after a stated change: a spacer, a sleeve, a machined seat" },
  { mark: "○", word: "Dimensions only", text: "the sizes agree; nobody has reported fitting it yet" },
];

export default async function HomePage({ searchParams }: { searchParams: Promise<{ "signed-out"?: string }> }) {
  const { "signed-out": signedOut } = await searchParams;
  return (
    <div className="space-y-12">
      {signedOut && (
        <Notice tone="success" role="status">
          You are signed out.
        </Notice>
      )}
      <section className="space-y-6">
        <div className="max-w-3xl space-y-3">
          <h1 className="text-3xl sm:text-4xl">The standard part that takes the old one&apos;s place</h1>
          <p className="text-lg text-ink-soft">
            The makers of fifty- to eighty-year-old tractors, crawlers and stationary engines numbered their bearings,
            seals and belts in their own way, and those numbers are long obsolete. Understudy is a moderated catalogue,
            kept by restorers, shops and clubs, of the standard parts that fit instead.
          </p>
        </div>
        <div
          className={
            "rounded-xl border-2 border-ink/80 bg-ground-raised p-5 " +
            "shadow-[6px_6px_0_0_rgba(35,38,43,0.85)] sm:p-7"
          }
        >
          <NumberSearch />
        </div>
      </section>

      <section aria-labelledby="jobs-heading" className="space-y-4">
        <h2 id="jobs-heading" className="text-2xl">
          What you can do here
        </h2>
        <ul className="grid gap-4 sm:grid-cols-2">
          {jobs.map((job) => (
            <li key={job.title} className="rounded-lg border border-rule bg-ground-raised p-5">
              <h3 className="mb-1 text-lg">{job.title}</h3>
              <p className="text-ink-soft">{job.text}</p>
              {job.href && (
                <Link href={job.href} className="mt-2 inline-block font-bold">
                  {job.action} →
                </Link>
              )}
            </li>
          ))}
        </ul>
      </section>

      <section
        aria-labelledby="fit-heading"
        className="grid gap-6 rounded-lg border border-rule bg-ground-sunk p-5 sm:grid-cols-[1fr_2fr]"
      >
        <div>
          <h2 id="fit-heading" className="text-2xl">
            How sure is a cross?
          </h2>
          <p className="mt-2 text-ink-soft">
            Every cross says how it fits and how many members have fitted it. None is guaranteed: measure before you
            order.
          </p>
        </div>
        <dl className="space-y-3">
          {fits.map((fit) => (
            <div key={fit.word} className="flex flex-col sm:flex-row sm:gap-3">
              <dt className="shrink-0 font-bold sm:w-52">
                <span aria-hidden="true" className="mr-2 text-brass">
                  {fit.mark}
                </span>
                {fit.word}
              </dt>
              <dd className="pl-6 text-ink-soft sm:pl-0">{fit.text}</dd>
            </div>
          ))}
        </dl>
      </section>
    </div>
  );
}
