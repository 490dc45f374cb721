import type { OutgoingMail } from "@/lib/mail/send";

// Every message has a plain-text body (read first by many workshop mail programs) and a simple HTML twin.
function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

interface Letter {
  subject: string;
  greeting: string;
  paragraphs: string[];
  action?: { label: string; url: string };
  after?: string[];
}

const BUTTON_STYLE =
  "background:#8a5d12;color:#fff;padding:12px 18px;border-radius:6px;text-decoration:none;font-weight:bold";
const NOTE_STYLE = "margin:0 0 14px;font-size:13px;color:#555";
const BODY_STYLE = "font-family:Arial,sans-serif;background:#f6f2ea;color:#23262b;padding:24px";

function compose(to: string, letter: Letter): OutgoingMail {
  const textParts = [letter.greeting, ...letter.paragraphs];
  if (letter.action) textParts.push(`${letter.action.label}:\n${letter.action.url}`);
  textParts.push(...(letter.after ?? []), "— Understudy, the standard-part catalogue for old machines");

  const p = (s: string) => `<p style="margin:0 0 14px;white-space:pre-line">${escapeHtml(s)}</p>`;
  const url = letter.action ? escapeHtml(letter.action.url) : "";
  const button = letter.action
    ? `<p style="margin:20px 0"><a href="${url}" style="${BUTTON_STYLE}">${escapeHtml(letter.action.label)}</a></p>
       <p style="${NOTE_STYLE}">If the button does not work, copy this address into your browser:<br>${url}</p>`
    : "";
  const html = `<!doctype html><html><body style="${BODY_STYLE}">
<div style="max-width:560px;margin:0 auto;background:#fffdf8;border:1px solid #d9d1c3;border-radius:8px;padding:24px">
<p style="margin:0 0 18px;font-weight:bold;letter-spacing:.04em">UNDERSTUDY</p>
${p(letter.greeting)}${letter.paragraphs.map(p).join("")}${button}${(letter.after ?? []).map(p).join("")}
<p style="margin:24px 0 0;font-size:13px;color:#555">Understudy, the standard-part catalogue for old machines</p>
</div></body></html>`;

  return { to, subject: letter.subject, text: textParts.join("\n\n"), html };
}

export function verifyEmailMail(to: string, url: string): OutgoingMail {
  return compose(to, {
    subject: "Confirm your e-mail for Understudy",
    greeting: "Hello,",
    paragraphs: [
      "Someone, we hope you, opened an Understudy account with this address.",
      "Confirm the address to sign in, propose crosses you have fitted and " +
        "keep job lists. The link works for 48 hours.",
    ],
    action: { label: "Confirm my e-mail", url },
    after: ["If you did not ask for this, ignore this message: no account is used until the address is confirmed."],
  });
}

export function accountExistsMail(to: string, resetUrl: string): OutgoingMail {
  return compose(to, {
    subject: "You already have an Understudy account",
    greeting: "Hello,",
    paragraphs: [
      "Someone tried to open a new Understudy account with this address, but it already has one.",
      "If that was you and you have forgotten the password, set a new one here. The link works for one hour.",
    ],
    action: { label: "Set a new password", url: resetUrl },
    after: ["If it was not you, ignore this message; your account has not changed."],
  });
}

export function resetPasswordMail(to: string, url: string): OutgoingMail {
  return compose(to, {
    subject: "Set a new Understudy password",
    greeting: "Hello,",
    paragraphs: ["You asked to set a new password for your Understudy account. The link works for one hour, once."],
    action: { label: "Set a new password", url },
    after: ["If you did not ask for this, ignore this message; your password stays as it is."],
  });
}

export interface DecisionLetter {
  outcome: "approved" | "rejected" | "changes_requested";
  partNumber: string;
  standard: string;
  message: string;
  url: string;
}

export function decisionMail(to: string, letter: DecisionLetter): OutgoingMail {
  const what = `${letter.partNumber} → ${letter.standard}`;
  const byOutcome = {
    approved: {
      subject: `Your cross is in the catalogue: ${what}`,
      paragraphs: [
        `A moderator checked your proposal ${what} and it is now in the catalogue, where other restorers will find it.`,
        "Thank you for taking the time to write it up.",
      ],
      label: "See it on the part's page",
    },
    rejected: {
      subject: `Your proposal was not accepted: ${what}`,
      paragraphs: [`A moderator checked your proposal ${what} and did not accept it.`],
      label: "See your proposals",
    },
    changes_requested: {
      subject: `Your proposal needs a change: ${what}`,
      paragraphs: [
        `A moderator checked your proposal ${what} and sent it back to you. ` +
          `Change it and send it again; it keeps its place.`,
      ],
      label: "Change the proposal",
    },
  }[letter.outcome];
  const message = letter.message ? [`The moderator wrote: “${letter.message}”`] : [];
  return compose(to, {
    subject: byOutcome.subject,
    greeting: "Hello,",
    paragraphs: [...byOutcome.paragraphs, ...message],
    action: { label: byOutcome.label, url: letter.url },
    after: ["You get these messages because you proposed a cross. You can turn them off on your account page."],
  });
}

export interface DigestItem {
  id: number;
  partNumber: string;
  standard: string;
  submittedAt: string;
}

export function digestMail(to: string, items: DigestItem[], queueUrl: string, waitingTotal: number): OutgoingMail {
  const lines = items.slice(0, 25).map((i) => `#${i.id}  ${i.partNumber} → ${i.standard}  (sent ${i.submittedAt})`);
  if (items.length > 25) lines.push(`… and ${items.length - 25} more.`);
  return compose(to, {
    subject: `${items.length} new ${items.length === 1 ? "proposal" : "proposals"} to review`,
    greeting: "Hello,",
    paragraphs: [
      `Members sent ${items.length} new ` +
        `${items.length === 1 ? "proposal" : "proposals"} since the last ` +
        `summary; ${waitingTotal} in all are waiting in the review queue.`,
      lines.join("\n"),
    ],
    action: { label: "Open the review queue", url: queueUrl },
    after: ["You get this summary because you review proposals. You can turn it off on your account page."],
  });
}
