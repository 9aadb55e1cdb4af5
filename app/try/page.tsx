import type { Metadata } from "next";
import Link from "next/link";
import { evaluateStudy, safeParseStudy } from "@/geometry";
import example from "@/public/examples/study.json";
import { Mark } from "../_ui/mark";
import { TryStudio } from "./try-studio";

export const metadata: Metadata = {
  title: "Try the fit studio",
  description: "An example case and two big-bore kits in the fit studio: drag the cut and watch the skirt clear.",
};

/** The example study (the same file the site serves at /examples/study.json), read and evaluated on the server. */
function exampleFit() {
  const parsed = safeParseStudy(example);
  if (!parsed.ok) return { error: `The example study could not be read: ${parsed.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}` };
  return { study: parsed.study, result: evaluateStudy(parsed.study) };
}

/** A public page: the fit studio on the example study, no account needed; the plan and the figures are in the first HTML. */
export default function TryPage() {
  const fit = exampleFit();
  return (
    <div className="mx-auto flex max-w-[96rem] flex-col gap-4 px-4 py-6">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <Link href="/" className="flex items-center gap-2 no-underline">
          <Mark />
          <span className="text-xl font-semibold tracking-tight text-ink">Borewright</span>
        </Link>
        <Link href="/sign-up" className="btn no-underline">
          Create an account to save studies
        </Link>
      </header>
      <main className="flex flex-col gap-4">
        <div>
          <h1 className="text-3xl font-semibold">Try the fit studio</h1>
          <p className="mt-1 max-w-3xl text-ink-2">
            An invented two-stroke case and two bigger kits. Drag the cut diameter and depth: the skirt, the interference and every figure follow.
            Nothing here is saved.
          </p>
        </div>
        {"error" in fit ? (
          <p className="field-error" role="alert">
            {fit.error}
          </p>
        ) : (
          <TryStudio study={fit.study} result={fit.result} />
        )}
      </main>
    </div>
  );
}
