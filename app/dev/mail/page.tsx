import type { Metadata } from "next";
import Link from "next/link";
import { Notice } from "@/components/ui/notice";
import { listCapturedMail } from "@/lib/dev/captured-mail";
import { AppError } from "@/lib/errors";

export const metadata: Metadata = { title: "Captured mail" };

export default async function CapturedMailPage() {
  let messages;
  try {
    messages = await listCapturedMail();
  } catch (error) {
    if (!(error instanceof AppError)) throw error;
    return (
      <Notice tone="caution" role="alert">
        {error.message}
      </Notice>
    );
  }
  return (
    <div className="space-y-4">
      <h1 className="text-3xl">Captured mail</h1>
      {messages.length === 0 ? (
        <p className="text-ink-soft">
          No mail yet. Open an account or ask for a password link, and the message appears here.
        </p>
      ) : (
        <ul className="divide-y divide-rule rounded-lg border border-rule bg-ground-raised">
          {messages.map((mail) => (
            <li key={mail.id}>
              <Link href={`/dev/mail/${mail.id}`} className="block p-4 text-ink no-underline hover:bg-ground-sunk">
                <span className="block font-bold">{mail.subject}</span>
                <span className="block text-sm text-ink-soft">
                  to {mail.to.join(", ")} · {new Date(mail.receivedAt).toLocaleString("en-GB", { timeZone: "UTC" })} UTC
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
