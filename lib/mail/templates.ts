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

function compose(to: string, letter: Letter): OutgoingMail {
  const textParts = [letter.greeting, ...letter.paragraphs];
  if (letter.action) textParts.push(`${letter.action.label}:\n${letter.action.url}`);
  textParts.push(...(letter.after ?? []), "— Understudy, the standard-part catalogue for old machines");

  const p = (s: string) => `<p style="margin:0 0 14px">${escapeHtml(s)}</p>`;
  const button = letter.action
    ? `<p style="margin:20px 0"><a href="${escapeHtml(letter.action.url)}" style="background:#8a5d12;color:#fff;padding:12px 18px;border-radius:6px;text-decoration:none;font-weight:bold">${escapeHtml(letter.action.label)}</a></p>
       <p style="margin:0 0 14px;font-size:13px;color:#555">If the button does not work, copy this address into your browser:<br>${escapeHtml(letter.action.url)}</p>`
    : "";
  const html = `<!doctype html><html><body style="font-family:Arial,sans-serif;background:#f6f2ea;color:#23262b;padding:24px">
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
      "Confirm the address to sign in, propose crosses you have fitted and keep job lists. The link works for 48 hours.",
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
