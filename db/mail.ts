import "server-only";
import nodemailer, { type Transporter } from "nodemailer";

export type OutgoingMail = { to: string; subject: string; text: string; html?: string };

let transporter: Transporter | undefined;

/** The SMTP transport from the environment: SMTP_HOST, SMTP_PORT, SMTP_USER, SMTP_PASS, SMTP_SECURE. */
function transport(): Transporter {
  if (transporter) return transporter;
  const port = Number(process.env.SMTP_PORT || 2525);
  const secure = process.env.SMTP_SECURE === "true";
  const user = process.env.SMTP_USER;
  transporter = nodemailer.createTransport({
    host: process.env.SMTP_HOST || "127.0.0.1",
    port,
    secure,
    // The local sink speaks plain SMTP; a hosted service negotiates TLS unless SMTP_IGNORE_TLS is set.
    ignoreTLS: process.env.SMTP_IGNORE_TLS === "true" || (!process.env.SMTP_HOST && !secure),
    auth: user ? { user, pass: process.env.SMTP_PASS ?? "" } : undefined,
  });
  return transporter;
}

export const MAIL_FROM = () => process.env.MAIL_FROM || "Borewright <no-reply@borewright.test>";

/** Sends one message; a failure is logged with its cause and rethrown so the caller can report it. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  try {
    await transport().sendMail({ from: MAIL_FROM(), ...mail });
  } catch (error) {
    console.error(`mail to ${mail.to} failed:`, error instanceof Error ? error.message : error);
    throw error;
  }
}

/** A plain message with one call to action, as text and as simple HTML. */
export function actionMail(to: string, subject: string, lines: string[], action: { label: string; url: string }): OutgoingMail {
  const text = [...lines, "", `${action.label}: ${action.url}`, "", "— Borewright"].join("\n");
  const escape = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;");
  const html = `${lines.map((l) => `<p>${escape(l)}</p>`).join("")}<p><a href="${escape(action.url)}">${escape(action.label)}</a></p><p>— Borewright</p>`;
  return { to, subject, text, html };
}
