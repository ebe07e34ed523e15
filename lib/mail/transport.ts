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

const LAB_HEADER = "X-Ionleaf-Lab";

export interface OutgoingMail {
  to: string;
  /** The lab the mail concerns: sent as a header so the local catcher's inbox can be scoped. */
  labId: string | null;
  subject: string;
  text: string;
  html?: string;
}

export async function sendMail({ labId, ...mail }: OutgoingMail): Promise<void> {
  await getTransport().sendMail({
    from: getEnv().MAIL_FROM,
    ...mail,
    headers: labId ? { [LAB_HEADER]: labId } : {},
  });
}
