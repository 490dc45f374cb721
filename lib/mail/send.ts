import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

let transporter: Transporter | undefined;

function getTransporter(): Transporter {
  transporter ??= nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD } : undefined,
    // The local fake speaks plain SMTP on loopback; a real relay negotiates TLS as usual.
    ignoreTLS: !env.SMTP_SECURE && env.SMTP_HOST === "127.0.0.1",
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
  });
  return transporter;
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  await getTransporter().sendMail({ from: env.MAIL_FROM, ...mail });
}

export async function checkMail(): Promise<void> {
  await getTransporter().verify();
}

/** Sends, and reports instead of throwing: the change that caused the mail stands whether or not it went out. */
export async function trySend(send: () => Promise<void>): Promise<boolean> {
  try {
    await send();
    return true;
  } catch (error) {
    console.error("[understudy] mail could not be sent", error);
    return false;
  }
}
