import { describe, expect, it } from "vitest";
import { JOB_STATUSES, STATUS_LABEL, decideMove, decidePlan, isJobStatus, moveNeedsReason, movesFrom, type MoveActor, type MoveFacts } from "@/model/job-status";

// The job's life is the product's own rule (no outside value): each decision is written out in full, words
// included, since the words are what the shop reads next to a refused button.

const builder: MoveActor = { role: "builder", isJobCustomer: false };
const owner: MoveActor = { role: "owner", isJobCustomer: false };
const customer: MoveActor = { role: "customer", isJobCustomer: true };
const otherCustomer: MoveActor = { role: "customer", isJobCustomer: false };
/** The answer for a move refused with this code and these words. */
const refused = (code: string, message: string) => ({ ok: false, code, message });
const ready: MoveFacts = { hasPlan: true, verification: "pass" };
const BENCH = "Only the shop's owner or builders move a job on the bench.";
const STEP_BACK = "Say why the job goes back a step; the reason is kept in its history.";

describe("job statuses", () => {
  it("knows its six statuses and nothing else", () => {
    for (const s of JOB_STATUSES) expect(isJobStatus(s)).toBe(true);
    for (const v of ["Intake", "closed ", "", "done", 0, null, undefined, ["intake"], { intake: true }]) expect(isJobStatus(v)).toBe(false);
  });

  it("names each status on screen", () => {
    expect(JOB_STATUSES.map((s) => STATUS_LABEL[s])).toEqual(["Intake", "Planned", "Approved", "Machined", "Verified", "Closed"]);
  });

  it("offers from each status the moves its table lists, forward first", () => {
    expect(movesFrom("intake")).toEqual(["planned"]);
    expect(movesFrom("planned")).toEqual(["approved", "intake"]);
    expect(movesFrom("approved")).toEqual(["machined", "planned"]);
    expect(movesFrom("machined")).toEqual(["verified"]);
    expect(movesFrom("verified")).toEqual(["closed", "machined"]);
    expect(movesFrom("closed")).toEqual([]);
  });
});

describe("a move that is not in the table", () => {
  it("to the status the job already has says so", () => {
    const words = { intake: "intake", planned: "planned", approved: "approved", machined: "machined", verified: "verified", closed: "closed" };
    for (const s of JOB_STATUSES) {
      expect(decideMove({ from: s, to: s, actor: owner, reason: "x", facts: ready })).toEqual({ ok: false, code: "not_allowed", message: `The job is already ${words[s]}.` });
    }
  });

  it("says why, in words for the kind of move", () => {
    const attempt = (from: (typeof JOB_STATUSES)[number], to: (typeof JOB_STATUSES)[number]) => decideMove({ from, to, actor: owner, reason: "x", facts: ready });
    expect(attempt("closed", "intake")).toEqual({ ok: false, code: "not_allowed", message: "A closed job is final; open a new job for further work." });
    expect(attempt("closed", "machined")).toMatchObject({ message: "A closed job is final; open a new job for further work." });
    expect(attempt("approved", "verified")).toEqual({ ok: false, code: "not_allowed", message: "A job cannot be verified before it is machined." });
    expect(attempt("intake", "machined")).toEqual({ ok: false, code: "not_allowed", message: "A job is machined only after its plan is approved." });
    expect(attempt("intake", "approved")).toEqual({ ok: false, code: "not_allowed", message: "Only a planned job can be approved: attach a study and a chosen kit first." });
    expect(attempt("machined", "closed")).toEqual({ ok: false, code: "not_allowed", message: "Close a job after its after-cut readings are verified." });
    expect(attempt("machined", "planned")).toEqual({ ok: false, code: "not_allowed", message: "Only a job at intake, or an approved job being re-planned, can go back to planned." });
    expect(attempt("machined", "intake")).toEqual({ ok: false, code: "not_allowed", message: "A machined job cannot go back to intake." });
    expect(attempt("verified", "intake")).toEqual({ ok: false, code: "not_allowed", message: "A verified job cannot go back to intake." });
  });
});

describe("who makes a move", () => {
  it("the shop's staff, owner or builder, move a job on the bench, without a reason going forward", () => {
    for (const actor of [owner, builder]) {
      expect(decideMove({ from: "intake", to: "planned", actor, facts: ready })).toEqual({ ok: true, needsReason: false });
      expect(decideMove({ from: "approved", to: "machined", actor, facts: ready })).toEqual({ ok: true, needsReason: false });
      expect(decideMove({ from: "machined", to: "verified", actor, facts: ready })).toEqual({ ok: true, needsReason: false });
      expect(decideMove({ from: "verified", to: "closed", actor, facts: ready })).toEqual({ ok: true, needsReason: false });
    }
  });

  it("no customer, not even the job's own, moves it on the bench or back a step", () => {
    for (const actor of [customer, otherCustomer])
      for (const [from, to] of [["intake", "planned"], ["planned", "intake"], ["approved", "planned"], ["approved", "machined"], ["verified", "machined"], ["verified", "closed"]] as const) {
        expect(decideMove({ from, to, actor, reason: "please", facts: ready }), `${from} → ${to}`).toEqual({ ok: false, code: "forbidden", message: BENCH });
      }
  });

  it("each step back needs a reason, which the move then records", () => {
    for (const [from, to] of [["planned", "intake"], ["approved", "planned"], ["verified", "machined"]] as const) {
      expect(decideMove({ from, to, actor: builder, facts: ready })).toEqual({ ok: false, code: "reason_required", message: STEP_BACK });
      expect(decideMove({ from, to, actor: builder, reason: " \t", facts: ready })).toEqual({ ok: false, code: "reason_required", message: STEP_BACK });
      expect(decideMove({ from, to, actor: builder, reason: "kit changed", facts: ready })).toEqual({ ok: true, needsReason: true });
      expect(moveNeedsReason(from, to, builder, ready)).toBe(true);
    }
  });
});

describe("approving a plan", () => {
  it("the job's own customer approves without a reason", () => {
    expect(decideMove({ from: "planned", to: "approved", actor: customer, facts: ready })).toEqual({ ok: true, needsReason: false });
    expect(moveNeedsReason("planned", "approved", customer, ready)).toBe(false);
  });

  it("another customer, a builder, or an owner without a reason cannot", () => {
    expect(decideMove({ from: "planned", to: "approved", actor: otherCustomer, reason: "x", facts: ready })).toEqual(refused("forbidden", "Only this job's own customer can approve its plan."));
    expect(decideMove({ from: "planned", to: "approved", actor: builder, reason: "x", facts: ready })).toEqual(refused("forbidden", "A plan is approved by its customer, or by the owner with a recorded reason."));
    expect(decideMove({ from: "planned", to: "approved", actor: owner, facts: ready })).toEqual(refused("reason_required", "An owner approving for the customer must record why (for example: approved by phone on a given day)."));
    // A refusal for who asks is not a question of a reason: the button asks none.
    expect(moveNeedsReason("planned", "approved", builder, ready)).toBe(false);
    expect(moveNeedsReason("planned", "approved", owner, ready)).toBe(true);
  });

  it("an owner with a reason approves for the customer and the reason is kept; the shop's own engine needs none", () => {
    expect(decideMove({ from: "planned", to: "approved", actor: owner, reason: "by phone", facts: ready })).toEqual({ ok: true, needsReason: true });
    expect(decideMove({ from: "planned", to: "approved", actor: owner, reason: "by phone", facts: { ...ready, ownEngine: true } })).toEqual({ ok: true, needsReason: false });
    expect(moveNeedsReason("planned", "approved", owner, { ...ready, ownEngine: true })).toBe(false);
  });

  it("a job with no plan has nothing to approve", () => {
    const noPlan: MoveFacts = { hasPlan: false, verification: null };
    expect(decideMove({ from: "planned", to: "approved", actor: customer, facts: noPlan })).toEqual({ ok: false, code: "precondition", message: "The job has no plan to approve." });
    expect(decideMove({ from: "planned", to: "approved", actor: owner, reason: "x", facts: noPlan })).toMatchObject({ ok: false, code: "precondition" });
  });
});

describe("planning a job", () => {
  it("needs a study and its kit attached", () => {
    expect(decideMove({ from: "intake", to: "planned", actor: builder, facts: { hasPlan: false, verification: null } })).toEqual(refused("precondition", "Attach a study and choose its kit before planning the job."));
  });

  it("a cannot-fit kit: a builder is refused, an owner asked why, and once recorded it is not asked again", () => {
    const cannot: MoveFacts = { hasPlan: true, verification: null, planVerdict: "cannot-fit" };
    expect(decideMove({ from: "intake", to: "planned", actor: builder, reason: "insists", facts: cannot })).toEqual(refused("forbidden", "The study says this kit cannot fit safely; only the shop's owner can plan it anyway, with a recorded reason."));
    expect(decideMove({ from: "intake", to: "planned", actor: owner, facts: cannot })).toEqual(refused("reason_required", "The study says this kit cannot fit safely. To plan it anyway, record why (for example: the customer accepts a passage welded and re-cut)."));
    expect(decideMove({ from: "intake", to: "planned", actor: builder, facts: { ...cannot, planOverridden: true } })).toEqual({ ok: true, needsReason: false });
  });

  it("the plan's checks belong to planning from intake, not to re-planning an approved job", () => {
    // Going back from approved asks for the step-back reason only, whatever the plan facts say.
    expect(decideMove({ from: "approved", to: "planned", actor: builder, reason: "kit changed", facts: { hasPlan: false, verification: null } })).toEqual({ ok: true, needsReason: true });
    expect(decideMove({ from: "approved", to: "planned", actor: builder, reason: "kit changed", facts: { hasPlan: true, verification: null, planVerdict: "cannot-fit" } })).toEqual({
      ok: true,
      needsReason: true,
    });
  });

  it("the plan rule alone", () => {
    expect(decidePlan({ verdict: "cannot-fit", actor: customer, reason: "x" })).toEqual({ ok: false, code: "forbidden", message: "Only the shop's owner or builders plan a job." });
    expect(decidePlan({ verdict: undefined, actor: customer })).toMatchObject({ ok: false, code: "forbidden" });
    for (const verdict of ["fits-as-is", "fits-after-cut", null, undefined] as const) {
      expect(decidePlan({ verdict, actor: owner })).toEqual({ ok: true, override: false });
      expect(decidePlan({ verdict, actor: builder })).toEqual({ ok: true, override: false });
    }
    expect(decidePlan({ verdict: "cannot-fit", actor: owner, reason: "\n " })).toMatchObject({ ok: false, code: "reason_required" });
  });
});

describe("verifying and closing", () => {
  it("readings are asked for only when verifying", () => {
    expect(decideMove({ from: "machined", to: "verified", actor: builder, facts: { hasPlan: true, verification: null } })).toEqual(refused("precondition", "Record the after-cut readings before verifying."));
    expect(decideMove({ from: "machined", to: "verified", actor: owner, reason: "x", facts: { hasPlan: true, verification: "incomplete" } })).toEqual(refused("precondition", "Some after-cut readings are missing; complete them before verifying."));
    // Closing or going back does not look at the readings again.
    for (const verification of [null, "incomplete", "fail"] as const) {
      expect(decideMove({ from: "verified", to: "closed", actor: builder, facts: { hasPlan: true, verification } })).toEqual({ ok: true, needsReason: false });
      expect(decideMove({ from: "approved", to: "machined", actor: builder, facts: { hasPlan: true, verification } })).toEqual({ ok: true, needsReason: false });
    }
  });

  it("failed readings: a builder is refused, an owner asked why, and the reason kept", () => {
    const failed: MoveFacts = { hasPlan: true, verification: "fail" };
    expect(decideMove({ from: "machined", to: "verified", actor: builder, reason: "fine", facts: failed })).toEqual(refused("forbidden", "The after-cut readings are outside the plan's tolerance; only the shop's owner can verify the job as it stands, with a recorded reason."));
    expect(decideMove({ from: "machined", to: "verified", actor: owner, facts: failed })).toEqual(refused("reason_required", "The after-cut readings are outside the plan's tolerance. To verify the job as it stands, record why (for example: trial fit checked, clearance accepted)."));
    expect(moveNeedsReason("machined", "verified", owner, failed)).toBe(true);
    expect(moveNeedsReason("machined", "verified", builder, failed)).toBe(false);
  });
});
