import type { ReasonCode, Verdict } from "@/geometry";
import { REASON_TEXT, blockingReasons } from "@/model/verdict";

/** Why a kit got its verdict, in plain words: the product's one set (model/verdict.ts). */
export const REASON_WORDS: Record<ReasonCode, string> = REASON_TEXT;

/** For a kit that cannot fit: the first reason that blocks it, in plain words (null otherwise). */
export function blockingReason(kit: { verdict: Verdict; reasons: readonly ReasonCode[] }): string | null {
  return blockingReasons(kit)[0] ?? null;
}
