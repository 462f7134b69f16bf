import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import type SMTPTransport from "nodemailer/lib/smtp-transport";
import { env } from "@/lib/env";

let transporter: Transporter | undefined;

/** Nodemailer over SMTP_URL. Short timeouts: a send that cannot connect fails fast and waits for a retry. */
export function mailTransport(): Transporter {
  const options: SMTPTransport.Options = {
    url: env().SMTP_URL,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 15_000,
  };
  transporter ??= nodemailer.createTransport(options);
  return transporter;
}

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export async function sendMail(message: MailMessage): Promise<{ messageId: string }> {
  const info = await mailTransport().sendMail({ from: env().MAIL_FROM, ...message });
  return { messageId: String(info.messageId ?? "") };
}
