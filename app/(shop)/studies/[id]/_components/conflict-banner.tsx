"use client";

import { useState } from "react";
import { ConfirmButton } from "../../../../_ui/form/confirm-button";

/** A save refused because someone else saved first: keep mine (save over theirs) or take theirs. */
export function ConflictBanner({ message, onOverwrite, onReload }: { message: string; onOverwrite: () => Promise<void>; onReload: () => Promise<void> }) {
  const [busy, setBusy] = useState(false);
  const run = (f: () => Promise<void>) => async () => {
    setBusy(true);
    try {
      await f();
    } finally {
      setBusy(false);
    }
  };
  return (
    <div role="alert" data-testid="conflict" className="flex flex-col gap-2 rounded-md border-l-4 border-error bg-paper-2 px-4 py-3 text-sm">
      <p className="font-semibold">Someone else changed this study.</p>
      <p>{message}</p>
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn" disabled={busy} onClick={run(onOverwrite)}>
          Keep my edits and save them
        </button>
        <ConfirmButton className="btn-quiet" disabled={busy} question="Load the other change? Your unsaved edits here will be dropped." onConfirm={() => void run(onReload)()}>
          Load their version instead
        </ConfirmButton>
      </div>
    </div>
  );
}
