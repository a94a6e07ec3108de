import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { serverEnv } from "@/lib/env";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
  replyTo?: string;
  fromName?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

let transport: Transporter | undefined;

function transporter(): Transporter {
  // SMTP_URL points at the local fake in development and tests, at a real relay in production.
  transport ??= nodemailer.createTransport(serverEnv().SMTP_URL);
  return transport;
}

/** Sends one message; the sender name can be the firm's, the address stays MAIL_FROM's. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  const from = serverEnv().MAIL_FROM;
  const address = from.match(/<([^>]+)>/)?.[1] ?? from;
  await transporter().sendMail({
    from: mail.fromName ? { name: mail.fromName, address } : from,
    to: mail.to,
    replyTo: mail.replyTo,
    subject: mail.subject,
    text: mail.text,
    html: mail.html,
    attachments: mail.attachments,
  });
}
