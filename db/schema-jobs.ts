// Tables for jobs, their readings, photos and payments. Kept apart from schema.ts so the two can grow side by side.
import { index, integer, real, sqliteTable, text, uniqueIndex, type SQLiteColumnBuilderBase } from "drizzle-orm/sqlite-core";
import { user } from "./schema";
import { photoCheck, photoObject } from "./schema-photos";
import { byWhomAndWhen, createdByRef, personRef, shopRef, version } from "./schema-refs";
import { createdAt, partOf, timestamp, updatedAt } from "./schema-columns";

/**
 * A table of a job's parts (its history, readings, photos, payments, questions): each row has its id and its
 * job, goes with the job, and is listed by job, then by the column `orderBy` when one is named.
 */
function partOfJob<Name extends string, Columns extends Record<string, SQLiteColumnBuilderBase>>(name: Name, columns: Columns, orderBy?: keyof Columns & string) {
  return sqliteTable(name, { id: text("id").primaryKey(), jobId: partOf("job_id", () => job.id), ...columns }, (t) => [
    index(`${name}_job_idx`).on(t.jobId, ...(orderBy ? [t[orderBy]] : [])),
  ]);
}

/**
 * A job: a customer's engine as a work order. The plan (the study's assembled Study and the core's result
 * for it, with the chosen kit) is kept as a snapshot taken when the job is planned, so what the customer
 * approves and what the bench card shows do not move when the study is edited later.
 */
export const job = sqliteTable(
  "job",
  {
    id: text("id").primaryKey(),
    organizationId: shopRef(),
    /** A short reference for the bench, e.g. "J-0007", unique in the shop. */
    reference: text("reference").notNull(),
    title: text("title").notNull(),
    /** The customer as a member of the shop, once they have an account there. */
    customerUserId: text("customer_user_id").references(() => user.id, { onDelete: "set null" }),
    customerName: text("customer_name").notNull(),
    customerEmail: text("customer_email").notNull(),
    /** The shop's own engine (a hobby builder's, or the shop's stock): no customer to share with; the owner approves. */
    ownEngine: integer("own_engine", { mode: "boolean" }).notNull().default(false),
    engineNumber: text("engine_number").notNull().default(""),
    caseNumber: text("case_number").notNull().default(""),
    caseVariant: text("case_variant").notNull().default(""),
    /** The study the plan comes from; a plain id (the study may later be archived or removed). */
    studyId: text("study_id"),
    kitId: text("kit_id"),
    /** { study, result, kitId, studyName, takenAt } — see db/jobs.ts PlanSnapshot. */
    planJson: text("plan_json"),
    status: text("status").notNull().default("intake"),
    /** Machining deposit in the smallest currency unit (cents), and its ISO currency code in lower case. */
    depositAmount: integer("deposit_amount").notNull().default(0),
    currency: text("currency").notNull().default("eur"),
    paidAt: timestamp("paid_at"),
    sharedAt: timestamp("shared_at"),
    approvedAt: timestamp("approved_at"),
    approvedById: text("approved_by_id"),
    approvedByName: text("approved_by_name"),
    approvalReason: text("approval_reason"),
    /**
     * An owner's override of the study's "cannot fit safely" for this plan: who, when and why. Null when the
     * plan fits (or none is taken); cleared when the plan is taken again.
     */
    planOverrideReason: text("plan_override_reason"),
    planOverrideById: text("plan_override_by_id"),
    planOverrideByName: text("plan_override_by_name"),
    planOverrideAt: timestamp("plan_override_at"),
    /** An owner's reason for verifying a job whose after-cut readings are outside the plan; cleared when it goes back to machined. */
    verifyOverrideReason: text("verify_override_reason"),
    verifyOverrideById: text("verify_override_by_id"),
    verifyOverrideByName: text("verify_override_by_name"),
    verifyOverrideAt: timestamp("verify_override_at"),
    /** The shop's quote for the job (model/quote.ts StoredQuote as JSON): lines, the rates it was priced at, the deposit. */
    quoteJson: text("quote_json"),
    /** The quote as the customer (or the owner for them) approved it together with the plan; cleared when the plan goes back to planned. */
    approvedQuoteJson: text("approved_quote_json"),
    /** Tolerance for after-cut verification, mm. */
    verifyToleranceMm: real("verify_tolerance_mm").notNull().default(0.05),
    notes: text("notes").notNull().default(""),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    createdBy: createdByRef(),
  },
  (t) => [
    index("job_shop_idx").on(t.organizationId, t.status),
    index("job_customer_idx").on(t.customerUserId),
    uniqueIndex("job_shop_reference_unique").on(t.organizationId, t.reference),
  ],
);

/** A job's history: status moves (with the reason when one is needed), shares, readings, payments. */
export const jobEvent = partOfJob(
  "job_event",
  {
    at: timestamp("at").notNull(),
    /** Null for events the payment service reported. */
    byId: text("by_id"),
    byName: text("by_name").notNull(),
    kind: text("kind").notNull(),
    fromStatus: text("from_status"),
    toStatus: text("to_status"),
    summary: text("summary").notNull(),
  },
  "at",
);

/** After-cut readings as recorded (each save is kept), with the verification verdict they gave. */
export const jobReading = partOfJob(
  "job_reading",
  {
    readingsJson: text("readings_json").notNull(),
    verificationJson: text("verification_json").notNull(),
    verdict: text("verdict").notNull(),
    takenAt: timestamp("taken_at").notNull(),
    takenById: personRef("taken_by_id"),
    takenByName: text("taken_by_name").notNull(),
  },
  "takenAt",
);

/** A photo of a job in object storage. `state`: pending (upload URL issued), ready (checked), refused. */
export const jobPhoto = partOfJob(
  "job_photo",
  {
    ...photoObject(),
    caption: text("caption").notNull().default(""),
    /** readings | before | after | trial-fit | other */
    kind: text("kind").notNull().default("other"),
    shared: integer("shared", { mode: "boolean" }).notNull().default(false),
    ...photoCheck(),
    createdAt: createdAt(),
    createdBy: createdByRef(),
  },
  "state",
);

/** A deposit asked of the customer through a hosted checkout; paid only when a signed event says so. */
export const jobPayment = partOfJob(
  "job_payment",
  {
    checkoutSessionId: text("checkout_session_id").notNull().unique(),
    /** Smallest currency unit. */
    amount: integer("amount").notNull(),
    currency: text("currency").notNull(),
    /** open | paid */
    status: text("status").notNull().default("open"),
    createdAt: createdAt(),
    createdById: personRef("created_by_id"),
    paidAt: timestamp("paid_at"),
  },
);

/** Payment-service events already handled, so a replayed event changes nothing. */
export const paymentEvent = sqliteTable("payment_event", {
  id: text("id").primaryKey(),
  type: text("type").notNull(),
  receivedAt: timestamp("received_at").notNull(),
});

/** A question the customer asked about the plan, kept on the job (and mailed to the shop). */
export const jobQuestion = partOfJob(
  "job_question",
  {
    ...byWhomAndWhen(),
    text: text("text").notNull(),
  },
  "at",
);


export type JobRecord = typeof job.$inferSelect;
export type JobPhotoRecord = typeof jobPhoto.$inferSelect;
