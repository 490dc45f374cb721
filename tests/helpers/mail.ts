interface CapturedMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
}

const MAIL_API = process.env.MAIL_FAKE_API_URL ?? "http://127.0.0.1:1180";

/** Waits for the mail fake to capture a message to this address (sending happens after the response). */
export async function waitForMail(to: string, subjectIncludes: string, timeoutMs = 10_000): Promise<CapturedMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const response = await fetch(`${MAIL_API}/messages?to=${encodeURIComponent(to)}`);
    const { messages } = (await response.json()) as { messages: CapturedMail[] };
    const found = messages.find((m) => m.subject.includes(subjectIncludes));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`No mail "${subjectIncludes}" reached ${to} within ${timeoutMs} ms`);
}

/** Waits until this address has `count` messages, and gives them; fails at the deadline. */
export async function waitForMailCount(to: string, count: number, timeoutMs = 10_000): Promise<CapturedMail[]> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const response = await fetch(`${MAIL_API}/messages?to=${encodeURIComponent(to)}`);
    const { messages } = (await response.json()) as { messages: CapturedMail[] };
    if (messages.length >= count) return messages;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`${to} did not reach ${count} messages within ${timeoutMs} ms`);
}

export async function mailCount(to: string): Promise<number> {
  const response = await fetch(`${MAIL_API}/messages?to=${encodeURIComponent(to)}`);
  return ((await response.json()) as { messages: unknown[] }).messages.length;
}

/** The first link in a message's text that leads to the given path, as a path with its query. */
export function linkTo(mail: CapturedMail, pathname: string): string {
  const url = mail.text
    .match(/https?:\/\/\S+/g)
    ?.map((u) => new URL(u))
    .find((u) => u.pathname === pathname);
  if (!url) throw new Error(`No link to ${pathname} in "${mail.subject}"`);
  return `${url.pathname}${url.search}`;
}
