import "server-only";
import { randomUUID } from "node:crypto";
import { and, eq, inArray } from "drizzle-orm";
import { appUrl } from "../auth";
import { getDb } from "../client";
import { actionMail, sendMail } from "../mail";
import * as schema from "../schema";
import * as jobs from "../schema-jobs";
import type { Person } from "./view";

// What a job keeps of its life (one line of history per change) and the mail the shop gets about it.

export type Tx = Parameters<Parameters<Awaited<ReturnType<typeof getDb>>["transaction"]>[0]>[0];

/** Adds one line to the job's history; `by` null for what the payment service reported. */
export async function addEvent(tx: Tx, jobId: string, by: Person | null, kind: string, summary: string, move?: { from: string; to: string }) {
  await tx.insert(jobs.jobEvent).values({
    id: randomUUID(),
    jobId,
    at: new Date(),
    byId: by?.id ?? null,
    byName: by?.name ?? "payment service",
    kind,
    fromStatus: move?.from ?? null,
    toStatus: move?.to ?? null,
    summary,
  });
}

/** Mails the shop's owners (and the job's creator) about something the customer did. */
export async function mailShop(shopId: string, record: jobs.JobRecord, subject: string, lines: string[]) {
  const db = await getDb();
  const people = await db
    .select({ email: schema.user.email, id: schema.user.id, role: schema.member.role })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
    .where(and(eq(schema.member.organizationId, shopId), inArray(schema.member.role, ["owner", "builder"])));
  const to = [...new Set(people.filter((p) => p.role === "owner" || p.id === record.createdBy).map((p) => p.email))];
  for (const address of to) {
    try {
      await sendMail(actionMail(address, subject, lines, { label: "Open the job", url: `${appUrl()}/jobs/${record.id}` }));
    } catch {
      // Logged by sendMail; what the customer did is already kept on the job.
    }
  }
}
