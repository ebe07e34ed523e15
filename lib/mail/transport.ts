import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { getEnv } from "@/lib/env";

let transporter: Transporter | null = null;

function getTransport(): Transporter {
  if (!transporter) {
    const env = getEnv();
    // Plain SMTP on loopback to the mail catcher in the demo and tests; a real relay is
    // configured by SMTP_HOST/SMTP_PORT alone.
    transporter = nodemailer.createTransport({
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      secure: false,
      ignoreTLS: true,
    });
  }
  return transporter;
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  await getTransport().sendMail({ from: getEnv().MAIL_FROM, ...mail });
}
