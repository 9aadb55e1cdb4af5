import type { ReactNode } from "react";

/** One figure: what it is, the number, and a line of explanation. */
export function Figure({ label, value, note, tone, testId }: { label: string; value: ReactNode; note?: ReactNode; tone?: "clear" | "tight" | "interfere"; testId?: string }) {
  const bar = tone === "clear" ? "border-l-clear" : tone === "tight" ? "border-l-tight" : tone === "interfere" ? "border-l-interfere" : "border-l-rule";
  return (
    <div className={`rounded-md border border-rule border-l-4 ${bar} bg-card px-3 py-2`} data-testid={testId}>
      <div className="text-xs text-ink-2">{label}</div>
      <div className="num text-lg text-ink">{value}</div>
      {note ? <div className="text-xs text-ink-2">{note}</div> : null}
    </div>
  );
}
