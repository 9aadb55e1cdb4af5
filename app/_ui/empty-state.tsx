import type { ReactNode } from "react";

/** What an empty list says: what it will hold, and what to do first. */
export function EmptyState({ title, children, action }: { title: string; children: ReactNode; action?: ReactNode }) {
  return (
    <div className="card flex flex-col items-start gap-3 border-dashed p-8">
      <h2 className="text-lg font-semibold">{title}</h2>
      <div className="max-w-prose text-ink-2">{children}</div>
      {action}
    </div>
  );
}
