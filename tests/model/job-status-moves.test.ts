import { describe, expect, it } from "vitest";
import { JOB_STATUSES, decideMove, decidePlan, moveNeedsReason, movesFrom, type JobStatus, type MoveActor, type MoveFacts } from "@/model/job-status";

const builder: MoveActor = { role: "builder", isJobCustomer: false };
const owner: MoveActor = { role: "owner", isJobCustomer: false };
const customer: MoveActor = { role: "customer", isJobCustomer: true };
const otherCustomer: MoveActor = { role: "customer", isJobCustomer: false };
const ready: MoveFacts = { hasPlan: true, verification: "pass" };

// Every allowed move, with who makes it and what it needs.
const ALLOWED: [JobStatus, JobStatus, MoveActor, string?][] = [
  ["intake", "planned", builder],
  ["planned", "approved", customer],
  ["planned", "approved", owner, "approved by phone"],
  ["planned", "intake", builder, "wrong case variant"],
  ["approved", "machined", builder],
  ["approved", "planned", owner, "customer changed the kit"],
  ["machined", "verified", builder],
  ["verified", "closed", owner],
  ["verified", "machined", builder, "re-cut after a second look"],
];

describe("the job status machine", () => {
  it.each(ALLOWED)("%s → %s is allowed for the right person", (from, to, actor, reason) => {
    expect(decideMove({ from, to, actor, reason, facts: ready })).toMatchObject({ ok: true });
  });

  it("every move not in the table is refused with a reason in words", () => {
    const allowed = new Set(ALLOWED.map(([a, b]) => `${a}>${b}`));
    let refused = 0;
    for (const from of JOB_STATUSES)
      for (const to of JOB_STATUSES) {
        if (allowed.has(`${from}>${to}`)) continue;
        const d = decideMove({ from, to, actor: owner, reason: "x", facts: ready });
        expect(d.ok, `${from} → ${to}`).toBe(false);
        if (!d.ok) expect(d.message.length).toBeGreaterThan(10);
        refused++;
      }
    expect(refused).toBe(36 - allowed.size);
  });

  it("a job cannot be verified before it is machined", () => {
    for (const from of ["intake", "planned", "approved"] as const) {
      const d = decideMove({ from, to: "verified", actor: builder, facts: ready });
      expect(d).toMatchObject({ ok: false, code: "not_allowed", message: "A job cannot be verified before it is machined." });
    }
  });

  it("a builder cannot approve; an owner must give a reason; another customer cannot", () => {
    expect(decideMove({ from: "planned", to: "approved", actor: builder, facts: ready })).toMatchObject({ ok: false, code: "forbidden" });
    expect(decideMove({ from: "planned", to: "approved", actor: owner, facts: ready })).toMatchObject({ ok: false, code: "reason_required" });
    expect(decideMove({ from: "planned", to: "approved", actor: owner, reason: "   ", facts: ready })).toMatchObject({ ok: false, code: "reason_required" });
    expect(decideMove({ from: "planned", to: "approved", actor: otherCustomer, facts: ready })).toMatchObject({ ok: false, code: "forbidden" });
  });

  it("a customer cannot move their job on the bench", () => {
    for (const [from, to] of [["intake", "planned"], ["approved", "machined"], ["machined", "verified"], ["verified", "closed"]] as const) {
      expect(decideMove({ from, to, actor: customer, facts: ready })).toMatchObject({ ok: false, code: "forbidden" });
    }
  });

  it("planning needs a plan; verifying needs readings that pass", () => {
    expect(decideMove({ from: "intake", to: "planned", actor: builder, facts: { hasPlan: false, verification: null } })).toMatchObject({ ok: false, code: "precondition" });
    expect(decideMove({ from: "machined", to: "verified", actor: builder, facts: { hasPlan: true, verification: null } })).toMatchObject({ ok: false, message: /Record the after-cut readings/ });
    expect(decideMove({ from: "machined", to: "verified", actor: builder, facts: { hasPlan: true, verification: "fail" } })).toMatchObject({ ok: false, message: /outside the plan's tolerance/ });
    expect(decideMove({ from: "machined", to: "verified", actor: builder, facts: { hasPlan: true, verification: "incomplete" } })).toMatchObject({ ok: false, message: /missing/ });
  });

  it("a step back needs a reason", () => {
    expect(decideMove({ from: "approved", to: "planned", actor: builder, facts: ready })).toMatchObject({ ok: false, code: "reason_required" });
  });

  it("a closed job is final", () => {
    expect(movesFrom("closed")).toEqual([]);
    expect(decideMove({ from: "closed", to: "verified", actor: owner, reason: "x", facts: ready })).toMatchObject({ ok: false, message: /final/ });
  });

  it("a kit the study calls cannot-fit is planned only by an owner who records why", () => {
    const cannot: MoveFacts = { hasPlan: true, verification: null, planVerdict: "cannot-fit" };
    expect(decideMove({ from: "intake", to: "planned", actor: builder, reason: "customer insists", facts: cannot })).toMatchObject({ ok: false, code: "forbidden", message: /only the shop's owner/ });
    expect(decideMove({ from: "intake", to: "planned", actor: owner, facts: cannot })).toMatchObject({ ok: false, code: "reason_required", message: /cannot fit safely/ });
    expect(decideMove({ from: "intake", to: "planned", actor: owner, reason: "  ", facts: cannot })).toMatchObject({ ok: false, code: "reason_required" });
    expect(decideMove({ from: "intake", to: "planned", actor: owner, reason: "passage to be welded first", facts: cannot })).toEqual({ ok: true, needsReason: true });
    expect(moveNeedsReason("intake", "planned", owner, cannot)).toBe(true);
    expect(moveNeedsReason("intake", "planned", builder, { ...cannot, planVerdict: "fits-after-cut" })).toBe(false);
  });

  it("a kit that fits is planned by a builder without a reason; an override already recorded is not asked again", () => {
    for (const planVerdict of ["fits-as-is", "fits-after-cut", null] as const) {
      expect(decideMove({ from: "intake", to: "planned", actor: builder, facts: { hasPlan: true, verification: null, planVerdict } })).toEqual({ ok: true, needsReason: false });
    }
    expect(decideMove({ from: "intake", to: "planned", actor: builder, facts: { hasPlan: true, verification: null, planVerdict: "cannot-fit", planOverridden: true } })).toMatchObject({ ok: true });
  });

  it("the plan rule alone: staff plan a fitting kit, only an owner with a reason a cannot-fit one, a customer never", () => {
    expect(decidePlan({ verdict: "fits-after-cut", actor: builder })).toEqual({ ok: true, override: false });
    expect(decidePlan({ verdict: "cannot-fit", actor: builder, reason: "why" })).toMatchObject({ ok: false, code: "forbidden" });
    expect(decidePlan({ verdict: "cannot-fit", actor: owner })).toMatchObject({ ok: false, code: "reason_required" });
    expect(decidePlan({ verdict: "cannot-fit", actor: owner, reason: "welded passage" })).toEqual({ ok: true, override: true });
    expect(decidePlan({ verdict: "fits-as-is", actor: customer })).toMatchObject({ ok: false, code: "forbidden" });
  });

  it("readings outside the plan are verified only by an owner who records why", () => {
    const failed: MoveFacts = { hasPlan: true, verification: "fail" };
    expect(decideMove({ from: "machined", to: "verified", actor: builder, reason: "looks fine", facts: failed })).toMatchObject({ ok: false, code: "forbidden" });
    expect(decideMove({ from: "machined", to: "verified", actor: owner, facts: failed })).toMatchObject({ ok: false, code: "reason_required", message: /outside the plan's tolerance/ });
    expect(decideMove({ from: "machined", to: "verified", actor: owner, reason: "trial fit checked, 0.02 mm accepted", facts: failed })).toEqual({ ok: true, needsReason: true });
    expect(decideMove({ from: "machined", to: "verified", actor: owner, reason: "x", facts: { hasPlan: true, verification: "incomplete" } })).toMatchObject({ ok: false, code: "precondition" });
    expect(decideMove({ from: "machined", to: "verified", actor: builder, facts: ready })).toEqual({ ok: true, needsReason: false });
  });

  it("the shop's own engine is approved by its owner without a reason, and still not by a builder", () => {
    const own: MoveFacts = { ...ready, ownEngine: true };
    expect(decideMove({ from: "planned", to: "approved", actor: owner, facts: own })).toEqual({ ok: true, needsReason: false });
    expect(decideMove({ from: "planned", to: "approved", actor: builder, facts: own })).toMatchObject({ ok: false, code: "forbidden" });
    expect(moveNeedsReason("planned", "approved", owner, ready)).toBe(true);
  });
});
