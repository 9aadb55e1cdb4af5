// The life of a job as a pure status machine: which moves are allowed, by whom, and why a refused move
// is refused. No I/O and no server code, so the data layer, the pages (server and browser) and the tests
// share it.

export const JOB_STATUSES = ["intake", "planned", "approved", "machined", "verified", "closed"] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

export function isJobStatus(value: unknown): value is JobStatus {
  return typeof value === "string" && (JOB_STATUSES as readonly string[]).includes(value);
}

/** What each status is called on screen. */
export const STATUS_LABEL: Record<JobStatus, string> = {
  intake: "Intake",
  planned: "Planned",
  approved: "Approved",
  machined: "Machined",
  verified: "Verified",
  closed: "Closed",
};

/** Who asks for a move: their role in the shop, and whether they are this job's own customer. */
export type MoveActor = { role: "owner" | "builder" | "customer"; isJobCustomer: boolean };

/** The study's verdict for the planned kit, as the core gives it. */
export type PlanVerdict = "fits-as-is" | "fits-after-cut" | "cannot-fit";

/** What the machine needs to know about the job to judge a move. */
export type MoveFacts = {
  /** A plan (study and chosen kit) is attached. */
  hasPlan: boolean;
  /** The after-cut verification verdict, when readings were recorded. */
  verification: "pass" | "fail" | "incomplete" | null;
  /** The study's verdict for the planned kit (absent or null: not known, judged as a kit that fits). */
  planVerdict?: PlanVerdict | null;
  /** An owner's override of a cannot-fit verdict is already recorded for this plan. */
  planOverridden?: boolean;
  /** The job is the shop's own engine: there is no customer, so the owner approves without a reason. */
  ownEngine?: boolean;
};

export type MoveRequest = { from: JobStatus; to: JobStatus; actor: MoveActor; reason?: string; facts: MoveFacts };

export type MoveRefusal = { ok: false; code: "not_allowed" | "forbidden" | "reason_required" | "precondition"; message: string };
export type MoveDecision = { ok: true; needsReason: boolean } | MoveRefusal;

/** The forward and backward moves that make sense, each with who may make it. */
type Rule = { staff: boolean; customer: boolean; ownerWithReason?: boolean; reasonRequired?: boolean };
const RULES: Partial<Record<JobStatus, Partial<Record<JobStatus, Rule>>>> = {
  intake: { planned: { staff: true, customer: false } },
  planned: {
    approved: { staff: false, customer: true, ownerWithReason: true },
    intake: { staff: true, customer: false, reasonRequired: true },
  },
  approved: {
    machined: { staff: true, customer: false },
    planned: { staff: true, customer: false, reasonRequired: true },
  },
  machined: { verified: { staff: true, customer: false } },
  verified: {
    closed: { staff: true, customer: false },
    machined: { staff: true, customer: false, reasonRequired: true },
  },
};

/** Why a move that is not in the table is refused, in words the shop understands. */
function notAllowed(from: JobStatus, to: JobStatus): string {
  if (from === to) return `The job is already ${STATUS_LABEL[to].toLowerCase()}.`;
  if (from === "closed") return "A closed job is final; open a new job for further work.";
  if (to === "verified") return "A job cannot be verified before it is machined.";
  if (to === "machined") return "A job is machined only after its plan is approved.";
  if (to === "approved") return "Only a planned job can be approved: attach a study and a chosen kit first.";
  if (to === "closed") return "Close a job after its after-cut readings are verified.";
  if (to === "planned") return "Only a job at intake, or an approved job being re-planned, can go back to planned.";
  return `A ${STATUS_LABEL[from].toLowerCase()} job cannot go back to ${STATUS_LABEL[to].toLowerCase()}.`;
}

/** The moves listed from a status, for the buttons a page offers. */
export function movesFrom(from: JobStatus): JobStatus[] {
  return Object.keys(RULES[from] ?? {}) as JobStatus[];
}

export type PlanDecision = { ok: true; override: boolean } | MoveRefusal;

/**
 * Whether this actor may plan a kit with this verdict: a kit that fits is planned by the shop's staff; a kit
 * the study calls cannot-fit only by an owner who records why (the override is kept with the plan).
 */
export function decidePlan({ verdict, actor, reason }: { verdict: PlanVerdict | null | undefined; actor: MoveActor; reason?: string }): PlanDecision {
  if (actor.role === "customer") return { ok: false, code: "forbidden", message: "Only the shop's owner or builders plan a job." };
  if (verdict !== "cannot-fit") return { ok: true, override: false };
  if (actor.role !== "owner")
    return { ok: false, code: "forbidden", message: "The study says this kit cannot fit safely; only the shop's owner can plan it anyway, with a recorded reason." };
  if (!hasText(reason))
    return { ok: false, code: "reason_required", message: "The study says this kit cannot fit safely. To plan it anyway, record why (for example: the customer accepts a passage welded and re-cut)." };
  return { ok: true, override: true };
}

const hasText = (s: string | undefined) => (s ?? "").trim().length > 0;

/** Whether a move is allowed for this actor on this job; a refusal says why. */
export function decideMove({ from, to, actor, reason, facts }: MoveRequest): MoveDecision {
  const rule = RULES[from]?.[to];
  if (!rule) return { ok: false, code: "not_allowed", message: notAllowed(from, to) };
  const hasReason = hasText(reason);
  const staff = actor.role === "owner" || actor.role === "builder";

  if (to === "approved") {
    if (actor.role === "customer") {
      if (!actor.isJobCustomer) return { ok: false, code: "forbidden", message: "Only this job's own customer can approve its plan." };
    } else if (actor.role === "owner") {
      if (!hasReason && !facts.ownEngine)
        return { ok: false, code: "reason_required", message: "An owner approving for the customer must record why (for example: approved by phone on a given day)." };
    } else {
      return { ok: false, code: "forbidden", message: "A plan is approved by its customer, or by the owner with a recorded reason." };
    }
  } else if (!(rule.staff && staff) && !(rule.customer && actor.role === "customer" && actor.isJobCustomer)) {
    return { ok: false, code: "forbidden", message: "Only the shop's owner or builders move a job on the bench." };
  }

  if (rule.reasonRequired && !hasReason) return { ok: false, code: "reason_required", message: "Say why the job goes back a step; the reason is kept in its history." };
  if (to === "planned" && from === "intake") {
    if (!facts.hasPlan) return { ok: false, code: "precondition", message: "Attach a study and choose its kit before planning the job." };
    if (!facts.planOverridden) {
      const plan = decidePlan({ verdict: facts.planVerdict, actor, reason });
      if (!plan.ok) return plan;
      if (plan.override) return { ok: true, needsReason: true };
    }
  }
  if (to === "approved" && !facts.hasPlan) return { ok: false, code: "precondition", message: "The job has no plan to approve." };
  if (to === "verified") {
    if (facts.verification === null) return { ok: false, code: "precondition", message: "Record the after-cut readings before verifying." };
    if (facts.verification === "incomplete") return { ok: false, code: "precondition", message: "Some after-cut readings are missing; complete them before verifying." };
    if (facts.verification === "fail") {
      if (actor.role !== "owner")
        return { ok: false, code: "forbidden", message: "The after-cut readings are outside the plan's tolerance; only the shop's owner can verify the job as it stands, with a recorded reason." };
      if (!hasReason)
        return { ok: false, code: "reason_required", message: "The after-cut readings are outside the plan's tolerance. To verify the job as it stands, record why (for example: trial fit checked, clearance accepted)." };
      return { ok: true, needsReason: true };
    }
  }
  return { ok: true, needsReason: Boolean(rule.reasonRequired || (to === "approved" && actor.role === "owner" && !facts.ownEngine)) };
}

/** Whether a move asks the actor for a reason before it is tried (for the buttons a page offers). */
export function moveNeedsReason(from: JobStatus, to: JobStatus, actor: MoveActor, facts: MoveFacts): boolean {
  const probe = decideMove({ from, to, actor, facts });
  return !probe.ok && probe.code === "reason_required";
}
