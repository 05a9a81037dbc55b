import nodemailer, { type Transporter } from "nodemailer";
import { config } from "~/lib/config.server";

let transport: Transporter | undefined;
let transportUrl: string | undefined;

export type OutgoingMail = { to: string; subject: string; text: string; html?: string };

/** Sends one message over SMTP (the local fake SMTP server in development and tests). */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  const url = config.smtpUrl;
  if (!transport || transportUrl !== url) {
    transport = nodemailer.createTransport(url);
    transportUrl = url;
  }
  await transport.sendMail({ from: config.mailFrom, ...mail });
}
