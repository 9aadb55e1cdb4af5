"use client";

import { useState } from "react";
import type { Point } from "@/geometry/homography";
import type { TracedPoints } from "./trace-shapes";

// What is being clicked on the photo (the reference points, the studs, the deck, the mouth or a passage)
// and the points placed for each, in the photo's pixels.

export type Target = "studs" | "deck" | "mouth" | `passage-${number}`;
export type Step = "reference" | "trace";

export const passageIndex = (t: Target) => Number(t.slice("passage-".length));

export function useTracePoints() {
  const [step, setStep] = useState<Step>("reference");
  const [target, setTarget] = useState<Target>("deck");
  const [points, setPoints] = useState<TracedPoints>({ studs: [], deck: [], mouth: [], mouthRound: true, passages: [] });

  /** Changes the points of the target with `f`. */
  const edit = (t: Target, f: (pts: Point[]) => Point[]) =>
    setPoints((all) => {
      if (t === "studs" || t === "deck") return { ...all, [t]: f(all[t]) };
      if (t === "mouth") return { ...all, mouth: f(all.mouth) };
      const i = passageIndex(t);
      return { ...all, passages: all.passages.map((s, k) => (k === i ? f(s) : s)) };
    });

  return {
    step,
    target,
    points,
    /** Clicks go to the target from now on. */
    aim: (s: Step, t?: Target) => {
      setStep(s);
      if (t) setTarget(t);
    },
    /** Adds a point to the target (a round mouth takes three). */
    place: (p: Point) => edit(target, (s) => (target === "mouth" && points.mouthRound && s.length >= 3 ? s : [...s, p])),
    removeLast: () => edit(target, (s) => s.slice(0, -1)),
    addPassage: () => {
      setPoints((all) => ({ ...all, passages: [...all.passages, []] }));
      setStep("trace");
      setTarget(`passage-${points.passages.length}`);
    },
    setMouthRound: (round: boolean) => setPoints((all) => ({ ...all, mouthRound: round, mouth: [] })),
    /** Everything traced goes; the reference is asked for again. */
    clear: () => {
      setPoints((all) => ({ studs: [], deck: [], mouth: [], mouthRound: all.mouthRound, passages: [] }));
      setStep("reference");
    },
    /** The points placed so far for what clicks go to now. */
    placedFor: (refPx: Point[]): Point[] => (step === "reference" ? refPx : target === "studs" || target === "deck" || target === "mouth" ? points[target] : (points.passages[passageIndex(target)] ?? [])),
  };
}

export type TracePoints = ReturnType<typeof useTracePoints>;
