import type { KitResult } from "@/geometry";
import { shopTimeZone } from "@/db/settings";
import { dateText } from "@/model/dates";
import { blockingReasons, VERDICT_TEXT } from "@/model/verdict";
import type { JobView } from "@/db/jobs";

// The verdicts' own colours (model/palette.ts), apart from the clearance bands'.
const TONE_BOX = {
  clear: "border-verdict-fits bg-verdict-fits-soft",
  tight: "border-verdict-after-cut bg-verdict-after-cut-soft",
  interfere: "border-verdict-cannot bg-verdict-cannot-soft",
} as const;
const TONE_WORDS = { clear: "text-verdict-fits", tight: "text-verdict-after-cut", interfere: "text-verdict-cannot" } as const;

/**
 * The study's verdict for the planned kit, at the top of the job: its words in its colour, why a kit cannot
 * fit, and the owner's override when one was recorded (or that planning it needs one).
 */
export function PlanVerdict({ kit, job }: { kit: Pick<KitResult, "verdict" | "reasons" | "name">; job: Pick<JobView, "plan" | "status"> }) {
  const { words, tone } = VERDICT_TEXT[kit.verdict];
  const reasons = blockingReasons(kit);
  const override = job.plan?.override ?? null;
  return (
    <section className={`rounded-md border-l-4 px-4 py-3 ${TONE_BOX[tone]}`} data-testid="plan-verdict" data-verdict={kit.verdict} aria-label="The study's verdict for the planned kit">
      <p className={`text-lg font-semibold ${TONE_WORDS[tone]}`}>
        {words} <span className="font-normal text-ink">— {kit.name}</span>
      </p>
      {reasons.length ? <p className="text-sm">Why: {reasons.join("; ")}.</p> : null}
      {kit.verdict === "cannot-fit" ? (
        override ? (
          <p className="mt-1 text-sm" data-testid="plan-override">
            Planned on {override.by.name}&apos;s override ({dateText(override.at, shopTimeZone())}): {override.reason}
          </p>
        ) : job.status === "intake" ? (
          <p className="mt-1 text-sm">Planning this kit needs the shop owner&apos;s override, with the reason recorded.</p>
        ) : (
          <p className="mt-1 text-sm">No override is recorded for this plan: do not cut before the shop&apos;s owner decides.</p>
        )
      ) : null}
    </section>
  );
}
