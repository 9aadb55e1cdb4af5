import "server-only";
import { randomUUID } from "node:crypto";
import { and, eq, inArray, sql } from "drizzle-orm";
import type { Caller } from "../access";
import { appUrl } from "../auth";
import { getDb } from "../client";
import { DataError } from "../errors";
import { actionMail, sendMail } from "../mail";
import * as schema from "../schema";
import * as jobs from "../schema-jobs";
import { addEvent, mailShop } from "./events";
import { getJob } from "./reads";
import { customerMemberId } from "./writes";
import { assertStaff, isJobCustomer, isStaff, loadFor, notFound, j, type JobView } from "./view";

// Sharing the plan with the customer (the consult link, or an invitation into the shop) and the
// customer's questions about it.

const INVITATION_DAYS = 7;

/**
 * Shares the job's plan with its customer: a customer already in the shop gets the consult link; anyone
 * else is invited into the shop with the customer role, the link to accept in the same mail.
 */
export async function shareJob(caller: Caller, id: string): Promise<{ job: JobView; invited: boolean }> {
  assertStaff(caller);
  const { record } = await loadFor(caller, id);
  if (!record.planJson) throw new DataError("no_plan", "Attach a study and choose its kit before sharing the plan.");
  if (record.ownEngine) throw new DataError("wrong_status", "This job is the shop's own engine: there is no customer to share the plan with.");
  const db = await getDb();
  const email = record.customerEmail.toLowerCase();
  const memberId = record.customerUserId ?? (await customerMemberId(caller.shopId, email));
  const [staffWithEmail] = await db
    .select({ id: schema.user.id })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
    .where(and(eq(schema.member.organizationId, caller.shopId), inArray(schema.member.role, ["owner", "builder"]), sql`lower(${schema.user.email}) = ${email}`))
    .limit(1);
  if (staffWithEmail) throw new DataError("customer_is_staff", "That address belongs to a member of the shop's staff; give the customer's own address.", { customerEmail: "This address belongs to the shop's staff." });
  const consultUrl = `${appUrl()}/consult/${record.id}`;
  const shop = await db.query.organization.findFirst({ where: eq(schema.organization.id, caller.shopId) });
  const shopName = shop?.name ?? caller.shopName;
  let invitationId: string | null = null;
  await db.transaction(async (tx) => {
    if (!memberId) {
      // The invitation the sign-in library's organization plugin reads and accepts; written here so a
      // builder (whose role may not invite staff) can still bring a customer in.
      await tx
        .update(schema.invitation)
        .set({ status: "canceled" })
        .where(and(eq(schema.invitation.organizationId, caller.shopId), sql`lower(${schema.invitation.email}) = ${email}`, eq(schema.invitation.status, "pending")));
      invitationId = randomUUID();
      await tx.insert(schema.invitation).values({
        id: invitationId,
        organizationId: caller.shopId,
        email,
        role: "customer",
        status: "pending",
        expiresAt: new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000),
        createdAt: new Date(),
        inviterId: caller.userId,
      });
    }
    await tx.update(j).set({ sharedAt: record.sharedAt ?? new Date(), customerUserId: memberId, updatedAt: new Date(), version: record.version + 1 }).where(eq(j.id, id));
    await addEvent(tx, id, { id: caller.userId, name: caller.name }, "share", memberId ? `shared the plan with ${record.customerName}` : `shared the plan and invited ${record.customerName} into the shop`);
  });
  const lines = [
    `Hello ${record.customerName},`,
    `${shopName} has prepared the plan for your engine (${record.title}): what each candidate kit gives, what must be cut, the risks and the price.`,
    "Look it over, ask the shop anything, and approve it when you are ready.",
  ];
  const mail = invitationId
    ? actionMail(email, `${shopName} shares the plan for your engine`, [
        ...lines,
        `First create your account (or sign in) and join ${shopName} as a customer; the plan is then at ${consultUrl}`,
        `The invitation is open for ${INVITATION_DAYS} days.`,
      ], { label: "Join and see the plan", url: `${appUrl()}/invite/${invitationId}` })
    : actionMail(email, `${shopName} shares the plan for your engine`, lines, { label: "See the plan", url: consultUrl });
  try {
    await sendMail(mail);
  } catch {
    // sendMail has logged the cause; the share is kept, and the caller is told to send the mail again.
    throw new DataError("mail_failed", "The plan is shared, but the e-mail could not be sent. Try sharing again in a moment.");
  }
  return { job: await getJob(caller, id), invited: invitationId !== null };
}

/** A question from the customer about the plan: kept on the job and mailed to the shop. */
export async function askQuestion(caller: Caller, id: string, textIn: string) {
  const { record } = await loadFor(caller, id);
  if (!isJobCustomer(caller, record) && !isStaff(caller)) throw notFound();
  const db = await getDb();
  const q = { id: randomUUID(), jobId: id, at: new Date(), byId: caller.userId, byName: caller.name, text: textIn.trim() };
  await db.transaction(async (tx) => {
    await tx.insert(jobs.jobQuestion).values(q);
    await addEvent(tx, id, { id: caller.userId, name: caller.name }, "question", `asked: ${q.text.slice(0, 140)}`);
  });
  if (caller.role === "customer") await mailShop(caller.shopId, record, `${record.reference}: a question from ${caller.name}`, [`${caller.name} asks about ${record.title}:`, q.text]);
  return { id: q.id, at: q.at.toISOString(), by: { id: caller.userId, name: caller.name }, text: q.text };
}
