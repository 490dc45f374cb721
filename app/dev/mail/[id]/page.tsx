import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { LinkedText } from "@/components/dev/linked-text";
import { getCapturedMail } from "@/lib/dev/captured-mail";

export const metadata: Metadata = { title: "Captured message" };

export default async function CapturedMessagePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const mail = await getCapturedMail(id);
  if (!mail) notFound();
  return (
    <article className="space-y-4">
      <Link href="/dev/mail">← All captured mail</Link>
      <h1 className="text-2xl">{mail.subject}</h1>
      <dl className="grid grid-cols-[5rem_1fr] gap-1 text-sm">
        <dt className="font-bold">From</dt>
        <dd>{mail.from}</dd>
        <dt className="font-bold">To</dt>
        <dd>{mail.to.join(", ")}</dd>
        <dt className="font-bold">Received</dt>
        <dd>{new Date(mail.receivedAt).toLocaleString("en-GB", { timeZone: "UTC" })} UTC</dd>
      </dl>
      <section className="rounded-lg border border-rule bg-ground-raised p-4" aria-label="Plain-text body">
        <LinkedText text={mail.text} />
      </section>
      {mail.html && (
        <details>
          <summary className="cursor-pointer font-bold">As the HTML version shows it</summary>
          {/* sandbox without permissions: the captured HTML can run nothing */}
          <iframe
            title="HTML body"
            sandbox=""
            srcDoc={mail.html}
            className="mt-2 h-[32rem] w-full rounded-lg border border-rule bg-white"
          />
        </details>
      )}
    </article>
  );
}
