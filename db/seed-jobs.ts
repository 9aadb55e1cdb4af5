// The demo shop's invented jobs, one in every status, built on the demo library's first study. One job
// carries after-cut readings that pass verification and one that fail; the demo customer has a shared
// plan waiting for approval. Idempotent: each row has a fixed id and is written only when missing.
import { eq, inArray } from "drizzle-orm";
import type { drizzle } from "drizzle-orm/libsql";
import { StudySchema, evaluateStudy, type Study, type StudyResult } from "../geometry";
import { formatMoney } from "../model/money";
import { quoteTotals, type StoredQuote } from "../model/quote";
import type { PlanSnapshot } from "./jobs";
import * as schema from "./schema";
import * as jobs from "./schema-jobs";
import { DEMO_CASES, DEMO_KITS, DEMO_RIGS, DEMO_STUDIES } from "./seed-library";
import { planFromResult, verifyCut, type AfterCutReadings } from "./verification";

type SeedDb = ReturnType<typeof drizzle<typeof schema>>;
type Person = { id: string; name: string; email: string };

/**
 * The demo study as the core reads it, from the seed's own data (the data layer assembles the same from
 * the rows; for a round mouth with readings, the smallest reading is the mouth diameter, as there).
 */
export function demoStudy(studyId = DEMO_STUDIES[0].id): { study: Study; name: string; chosenKitId: string } {
  const s = DEMO_STUDIES.find((x) => x.id === studyId);
  if (!s) throw new Error(`no demo study ${studyId}`);
  const c = DEMO_CASES.find((x) => x.id === s.caseId)!;
  const data = structuredClone(c.data) as Record<string, unknown> & { mouth: { outline: { kind: string; diameterMm?: number } } };
  if (data.mouth.outline.kind === "circle" && c.mouthReadingsMm.length) data.mouth.outline.diameterMm = Math.min(...c.mouthReadingsMm);
  const rig = s.rigId ? DEMO_RIGS.find((r) => r.id === s.rigId) : undefined;
  const study = StudySchema.parse({
    name: s.name,
    case: { ...data, name: c.name },
    kits: s.kitIds.map((id) => {
      const k = DEMO_KITS.find((x) => x.id === id)!;
      // The price is money the core never reads; it stays with the library row.
      return { ...k.data, price: undefined, id: k.id, name: k.name };
    }),
    ...(rig ? { rig: { ...rig.data, name: rig.name } } : {}),
    ...(s.cut ? { cut: s.cut } : {}),
    ...(s.readings ? { readings: s.readings } : {}),
    ...(s.limits ? { limits: s.limits } : {}),
  });
  return { study, name: s.name, chosenKitId: s.chosenKitId ?? s.kitIds[0] };
}

/**
 * The demo's after-cut readings for the planned kit: one set on size that verifies, one cut 0.25 mm small that
 * fails. Each set could be read off one real cut (lands follow the cut's size).
 */
export function demoAfterCutReadings(study: Study, result: StudyResult, kitId: string) {
  const vplan = planFromResult(result, kitId);
  const thinnestGasket = Math.min(...(study.kits.find((k) => k.id === kitId)?.baseGasketsMm ?? [0]));
  const r2 = (v: number) => Math.round(v * 100) / 100;
  // Readings that can happen together: the land at a stud is what the cut's radius leaves, so a cut that came
  // out larger leaves thinner lands and one that came out smaller leaves thicker ones (the widest reading counts).
  const readingsFor = (cutDiameterMm: number[], trialFit: AfterCutReadings["trialFit"]): AfterCutReadings => {
    const overMm = (Math.max(...cutDiameterMm) - vplan.cutDiameterMm) / 2;
    return {
      cutDiameterMm,
      cutDepthMm: [vplan.cutDepthMm + 0.01, vplan.cutDepthMm + 0.02].map(r2),
      sealingLandMm: vplan.studs.map((s) => ({ stud: s.label, valueMm: r2(s.plannedMm - overMm) })),
      gasketStackMm: thinnestGasket,
      chipsCleaned: true,
      trialFit,
    };
  };
  const onSize = [vplan.cutDiameterMm, vplan.cutDiameterMm + 0.02, vplan.cutDiameterMm - 0.01].map(r2);
  const passing = readingsFor(onSize, "goes-home");
  // A cut that came out 0.25 mm small: the skirt binds, and the lands are thicker than planned.
  const failing = readingsFor(onSize.map((v) => r2(v - 0.25)), "binds");
  const pass = verifyCut(vplan, passing);
  const fail = verifyCut(vplan, failing);
  return { vplan, passing, failing, pass, fail };
}

const STATUSES = ["intake", "planned", "approved", "machined", "verified", "closed"] as const;

/** The demo shop's prices (its settings row): euros, 60.00 an hour, 20 % tax, 30 % deposit. */
export const DEMO_PRICING = { currency: "EUR", labourRateMinor: 6000, taxPercent: 20, depositPercent: 30 } as const;

/**
 * The demo quote for a planned job: the kit at its library price, two base gaskets and a set of stud nuts,
 * an hour and a half of machining at the shop's rate, tax and the deposit share.
 */
export function demoQuote(kitId: string, kitName: string, at: Date, by: Person): StoredQuote {
  const price = DEMO_KITS.find((k) => k.id === kitId)?.data.price;
  if (!price || price.currency !== DEMO_PRICING.currency) throw new Error(`the demo kit ${kitId} has no price in ${DEMO_PRICING.currency}`);
  return {
    currency: DEMO_PRICING.currency,
    kit: { label: kitName, unitMinor: price.amountMinor },
    kitId,
    kitStale: null,
    parts: [
      { label: "Base gasket", quantity: 2, unitMinor: 1250 },
      { label: "Stud nuts, set of four", quantity: 1, unitMinor: 840 },
    ],
    machiningHours: 1.5,
    others: [],
    labourRateMinor: DEMO_PRICING.labourRateMinor,
    taxPercent: DEMO_PRICING.taxPercent,
    depositPercent: DEMO_PRICING.depositPercent,
    depositOverride: null,
    updatedAt: at.toISOString(),
    updatedBy: { id: by.id, name: by.name },
  };
}

/** Inserts the demo jobs where missing; returns how many jobs it wrote. Needs the demo library in place. */
export async function seedJobs(db: SeedDb, shopId: string, people: { owner: Person; builder: Person; customer: Person }): Promise<number> {
  const { study, name: studyName, chosenKitId } = demoStudy();
  const result = evaluateStudy(study);
  const kit = result.kits.find((k) => k.kitId === chosenKitId)!;
  const at = (day: number, hour = 9) => new Date(Date.UTC(2026, 1, day, hour, 0));
  // The times of the steps every demo job that reached them shares; the job page and its history show the same time for each.
  const TIMES = { created: at(1), planned: at(2), quoted: at(2, 11), shared: at(3), approved: at(4), paid: at(4, 12), readings: at(7, 15) };
  const plan: PlanSnapshot = { studyId: DEMO_STUDIES[0].id, studyName, kitId: kit.kitId, kitName: kit.name, study, result, takenAt: TIMES.planned.toISOString() };
  const { passing, failing, pass, fail } = demoAfterCutReadings(study, result, kit.kitId);
  if (pass.verdict !== "pass" || fail.verdict !== "fail") throw new Error(`demo readings did not verify as meant (${pass.verdict}, ${fail.verdict})`);

  const contacts = [
    { name: "Osric Penhallow", email: "osric.penhallow@example.test", userId: null },
    { name: people.customer.name, email: people.customer.email, userId: people.customer.id },
    { name: people.customer.name, email: people.customer.email, userId: people.customer.id },
    { name: "Maud Treverrow", email: "maud.treverrow@example.test", userId: null },
    { name: "Jory Quennell", email: "jory.quennell@example.test", userId: null },
    { name: "Tamsin Allory", email: "tamsin.allory@example.test", userId: null },
  ];
  const titles = [
    "Marlet 50 walk-in, still to be measured",
    "Marlet 50 daily rider, 47 mm conversion",
    "Marlet 50 weekend scooter, 47 mm conversion",
    "Marlet 50 delivery scooter, 47 mm conversion",
    "Marlet 50 restoration, 47 mm conversion",
    "Marlet 50 club racer, 47 mm conversion",
  ];
  const ids = STATUSES.map((s) => `demo-job-${s}`);
  // Every planned demo job carries the same quote, written when the plan was taken; the approved ones keep it as approved.
  const quote = demoQuote(kit.kitId, kit.name, TIMES.quoted, people.builder);
  const quoteJson = JSON.stringify(quote);
  const figures = quoteTotals(quote);
  const deposit = figures.deposit.amountMinor;
  const quoteWords = `the plan and the quote (total ${formatMoney(figures.total)}, deposit ${formatMoney(figures.deposit)})`;
  let written = 0;
  await db.transaction(async (tx) => {
    const have = new Set((await tx.select({ id: jobs.job.id }).from(jobs.job).where(inArray(jobs.job.id, ids))).map((r) => r.id));
    const study0 = await tx.select({ id: schema.study.id }).from(schema.study).where(eq(schema.study.id, DEMO_STUDIES[0].id));
    if (study0.length === 0) throw new Error("seed the demo library first (db/seed-library.ts)");
    for (const [i, status] of STATUSES.entries()) {
      const id = ids[i];
      if (have.has(id)) continue;
      const c = contacts[i];
      const planned = i >= 1;
      const approved = i >= 2;
      // An event that has a column of its own (the plan taken, the approval, the payment, the readings) is at that column's time.
      const event = (n: number, kind: string, summary: string, by: Person | null, move?: [string, string], key = String(n), when = at(1 + n, 10 + i)) => ({
        id: `${id}-e${key}`,
        jobId: id,
        at: when,
        byId: by?.id ?? null,
        byName: by?.name ?? "payment service",
        kind,
        fromStatus: move?.[0] ?? null,
        toStatus: move?.[1] ?? null,
        summary,
      });
      await tx.insert(jobs.job).values({
        id,
        organizationId: shopId,
        reference: `J-${String(i + 1).padStart(4, "0")}`,
        title: titles[i],
        customerUserId: c.userId,
        customerName: c.name,
        customerEmail: c.email,
        engineNumber: `MR50-${4410 + i}`,
        caseNumber: `C-${7700 + i * 13}`,
        caseVariant: "four-stud, round mouth",
        studyId: planned ? plan.studyId : null,
        kitId: planned ? plan.kitId : null,
        planJson: planned ? JSON.stringify(plan) : null,
        status,
        quoteJson: planned ? quoteJson : null,
        approvedQuoteJson: approved ? quoteJson : null,
        depositAmount: planned ? deposit : 5000,
        currency: "eur",
        paidAt: approved ? TIMES.paid : null,
        sharedAt: planned ? TIMES.shared : null,
        approvedAt: approved ? TIMES.approved : null,
        approvedById: approved ? (i === 2 ? people.customer.id : people.owner.id) : null,
        approvedByName: approved ? (i === 2 ? people.customer.name : people.owner.name) : null,
        approvalReason: approved && i !== 2 ? "approved by phone" : null,
        createdAt: TIMES.created,
        updatedAt: at(6 + i),
        createdBy: people.builder.id,
      });
      const events = [event(0, "created", `opened the job for ${c.name}`, people.builder, undefined, "0", TIMES.created)];
      if (planned) events.push(event(1, "status", `planned with ${kit.name} from the study "${studyName}"`, people.builder, ["intake", "planned"], "1", TIMES.planned));
      if (planned) events.push(event(2, "quote", `wrote the quote: total ${formatMoney(figures.total)}, deposit ${formatMoney(figures.deposit)}`, people.builder, undefined, "2q", TIMES.quoted));
      if (planned) events.push(event(2, "share", `shared the plan with ${c.name}`, people.builder, undefined, "2", TIMES.shared));
      if (approved) {
        events.push(event(3, "status", i === 2 ? `approved ${quoteWords}` : `approved ${quoteWords} for the customer: approved by phone`, i === 2 ? people.customer : people.owner, ["planned", "approved"], "3", TIMES.approved));
        events.push(event(4, "payment", `deposit paid: ${formatMoney(figures.deposit)}`, null, undefined, "4", TIMES.paid));
      }
      if (i >= 3) events.push(event(5, "status", "moved the job from approved to machined", people.builder, ["approved", "machined"]));
      if (i === 3) events.push(event(6, "readings", "recorded after-cut readings: fail (cut diameter, radial clearance to the cut, trial fit)", people.builder, undefined, "6", TIMES.readings));
      if (i >= 4) {
        events.push(event(6, "readings", "recorded after-cut readings: within the plan", people.builder, undefined, "6", TIMES.readings));
        events.push(event(7, "status", "moved the job from machined to verified", people.builder, ["machined", "verified"]));
      }
      if (i === 5) events.push(event(8, "status", "moved the job from verified to closed", people.owner, ["verified", "closed"]));
      await tx.insert(jobs.jobEvent).values(events);
      if (approved) {
        await tx.insert(jobs.jobPayment).values({ id: `${id}-deposit`, jobId: id, checkoutSessionId: `cs_demo_${id}`, amount: deposit, currency: "eur", status: "paid", createdAt: TIMES.approved, createdById: c.userId ?? people.owner.id, paidAt: TIMES.paid });
      }
      if (i >= 3) {
        const r = i === 3 ? failing : passing;
        const v = i === 3 ? fail : pass;
        await tx.insert(jobs.jobReading).values({ id: `${id}-readings`, jobId: id, readingsJson: JSON.stringify(r), verificationJson: JSON.stringify(v), verdict: v.verdict, takenAt: TIMES.readings, takenById: people.builder.id, takenByName: people.builder.name });
      }
      if (i === 1) {
        await tx.insert(jobs.jobQuestion).values({ id: `${id}-q1`, jobId: id, at: at(3, 18), byId: people.customer.id, byName: people.customer.name, text: "Does the bigger kit change what licence I need for the scooter?" });
      }
      written++;
    }
  });
  return written;
}
