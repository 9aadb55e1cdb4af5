"use client";

export type StudyTab = "plan" | "lineup";

const TABS: readonly [StudyTab, string][] = [
  ["plan", "Plan and results"],
  ["lineup", "Lineup"],
];

/** The study's two views: the plan with its results, and the lineup of every kit. */
export function StudyTabs({ tab, onTab }: { tab: StudyTab; onTab: (t: StudyTab) => void }) {
  return (
    <div role="tablist" aria-label="Study views" className="flex gap-1 border-b border-rule">
      {TABS.map(([t, label]) => (
        <button
          key={t}
          type="button"
          role="tab"
          aria-selected={tab === t}
          onClick={() => onTab(t)}
          className={`-mb-px rounded-t-md border px-4 py-2 text-sm ${tab === t ? "border-rule border-b-paper bg-paper font-semibold" : "border-transparent text-ink-2 hover:text-ink"}`}
        >
          {label}
        </button>
      ))}
    </div>
  );
}
