import nodemailer, { type Transporter } from "nodemailer";
import { env } from "~/config/env.server";
import type { MailContent } from "./templates";

// One pooled transport per process: the dev catcher (like many providers) delays each new connection,
// so reusing connections keeps sign-up fast. A real provider is a change of SMTP_* settings only.
const globalForMail = globalThis as typeof globalThis & { __drysideMailer?: Transporter };

function transport(): Transporter {
  if (!globalForMail.__drysideMailer) {
    const e = env();
    globalForMail.__drysideMailer = nodemailer.createTransport({
      pool: true,
      host: e.SMTP_HOST,
      port: e.SMTP_PORT,
      secure: e.SMTP_SECURE,
      auth: e.SMTP_USER ? { user: e.SMTP_USER, pass: e.SMTP_PASSWORD ?? "" } : undefined,
      connectionTimeout: 5000,
    });
  }
  return globalForMail.__drysideMailer;
}

export async function sendMail(to: string, content: MailContent): Promise<void> {
  await transport().sendMail({
    from: env().MAIL_FROM,
    to,
    subject: content.subject,
    text: content.text,
    html: content.html,
  });
}

/**
 * Sends without letting a mail outage fail the request that triggered it: the account change is already
 * saved and the person can ask for a new link. The failure is logged for the operator.
 */
export async function sendMailOrLog(to: string, content: MailContent): Promise<boolean> {
  try {
    await sendMail(to, content);
    return true;
  } catch (error) {
    console.error(`mail to ${to} (“${content.subject}”) failed:`, error instanceof Error ? error.message : error);
    return false;
  }
}

/** Closes pooled connections (tests and scripts that must exit). */
export function closeMailer(): void {
  globalForMail.__drysideMailer?.close();
  globalForMail.__drysideMailer = undefined;
}
