import type { Verification } from "@/db/verification";
import { shopTimeZone } from "@/db/settings";
import { dateTimeText } from "@/model/dates";
import { lengthLabel } from "@/model/units";

const STATE = { ok: ["within", "text-success"], fail: ["outside", "text-error"], missing: ["missing", "text-caution"] } as const;

/** The after-cut readings beside the plan, line by line, with by how much a line is outside. */
export function PlanVsActual({ verification, at }: { verification: Verification; at: string }) {
  const verdict = verification.verdict;
  return (
    <div className="flex flex-col gap-2">
      <p className={`rounded-md border-l-4 px-4 py-2 text-sm ${verdict === "pass" ? "border-success bg-paper-2" : verdict === "fail" ? "border-error bg-paper-2" : "border-caution bg-caution-soft"}`} data-testid="verdict">
        {verdict === "pass" ? "Within the plan" : verdict === "fail" ? "Outside the plan" : "Incomplete"} — readings of {dateTimeText(at, shopTimeZone())}, shop tolerance ±{lengthLabel(verification.toleranceMm, "mm")}.
      </p>
      <div className="card relative overflow-x-auto">
        <table className="w-full text-sm">
          <thead className="border-b border-rule text-left text-ink-2">
            <tr><th className="px-3 py-2">Check</th><th className="px-3 py-2">Plan</th><th className="px-3 py-2">Actual</th><th className="px-3 py-2">Result</th></tr>
          </thead>
          <tbody>
            {verification.checks.map((c, i) => (
              <tr key={i} className="border-b border-rule last:border-0">
                <td className="px-3 py-2">{c.label}</td>
                <td className="px-3 py-2 num">{c.planned}</td>
                <td className="px-3 py-2 num">{c.actual}</td>
                <td className={`px-3 py-2 ${STATE[c.state][1]}`}>
                  <strong>{STATE[c.state][0]}</strong> {c.state === "ok" ? "" : `— ${c.message}`}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
