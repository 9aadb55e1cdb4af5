import "server-only";
import { eq } from "drizzle-orm";
import nodemailer, { type Transporter } from "nodemailer";
import type { Caller } from "./access";
import { getDb } from "./client";
import * as schema from "./schema";

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

/** A message the local mail sink caught, as its HTTP listing gives it. */
export type CaughtMail = { id: string; to: string[]; subject: string; text: string; links: string[]; receivedAt: string };

/** Links that act on one person's account (reset a password, confirm an address): only the addressee may see them. */
const ACCOUNT_LINK = /\/(?:api\/auth\/|reset-password|verify-email)/;

/**
 * The caught mail the caller may read: mail addressed to the caller; the invitations of the caller's shop;
 * and other mail to members of the caller's shop that carries no link acting on an account. Null when the
 * local mail sink is not configured or does not answer.
 */
export async function readOutbox(caller: Pick<Caller, "email" | "shopId">): Promise<CaughtMail[] | null> {
  const sink = process.env.MAIL_SINK_URL;
  if (!sink) return null;
  let messages: CaughtMail[];
  try {
    const res = await fetch(`${sink}/messages`, { cache: "no-store" });
    if (!res.ok) return null;
    messages = ((await res.json()) as { messages: CaughtMail[] }).messages;
  } catch (error) {
    // The sink is a local development aid: when it is down the Outbox says so, and nothing else depends on it.
    console.warn(`mail sink at ${sink} did not answer:`, error instanceof Error ? error.message : error);
    return null;
  }
  const db = await getDb();
  const members = await db
    .select({ email: schema.user.email })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
    .where(eq(schema.member.organizationId, caller.shopId));
  const invitations = await db.select({ id: schema.invitation.id }).from(schema.invitation).where(eq(schema.invitation.organizationId, caller.shopId));
  const me = caller.email.toLowerCase();
  const memberEmails = new Set(members.map((m) => m.email.toLowerCase()));
  const invitationPaths = new Set(invitations.map((i) => `/invite/${i.id}`));
  const pathOf = (link: string) => {
    try {
      return new URL(link).pathname;
    } catch {
      // A link that is not a URL acts on no account and opens no invitation: no path matches it.
      return "";
    }
  };
  return messages.filter((m) => {
    const to = m.to.map((a) => a.toLowerCase());
    if (to.length > 0 && to.every((a) => a === me)) return true;
    if (m.links.some((l) => invitationPaths.has(pathOf(l)))) return !m.links.some((l) => ACCOUNT_LINK.test(pathOf(l)));
    return to.length > 0 && to.every((a) => memberEmails.has(a)) && !m.links.some((l) => ACCOUNT_LINK.test(pathOf(l)));
  });
}
