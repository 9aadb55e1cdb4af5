"use client";

export default function ErrorPage({ reset }: { error: Error; reset: () => void }) {
  return (
    <div className="mx-auto flex min-h-[60dvh] max-w-lg flex-col justify-center gap-3 px-6">
      <h1 className="text-2xl font-semibold">Something went wrong</h1>
      <p className="text-ink-2">Nothing you typed was sent twice. Try again; if it keeps happening, tell the shop&apos;s owner.</p>
      <button type="button" className="btn self-start" onClick={reset}>
        Try again
      </button>
    </div>
  );
}
