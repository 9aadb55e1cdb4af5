"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { DEFAULT_LIMITS, inToMm, mmToIn } from "@/geometry";
import { callApi } from "../../../_ui/api-client";
import { FormNotice } from "../../../_ui/field";
import { LIMIT_TERM } from "@/model/glossary";

type LengthKey = "minRadialClearanceMm" | "minDepthClearanceMm" | "minSealingLandMm" | "minWallMm" | "studToleranceMm" | "hardwareMarginMm" | "maxRockMm" | "minCrankClearanceMm";
type SpeedKey = "cuttingSpeedMinMPerMin" | "cuttingSpeedMaxMPerMin";
type Key = LengthKey | SpeedKey | "displacementClassesCc";

// Each limit's name and why, the same words as the study page (model/glossary.ts).
const FIELDS: Array<{ key: Key; label: string; kind: "length" | "speed" | "classes"; why: string }> = [
  { key: "minRadialClearanceMm", label: LIMIT_TERM.minRadialClearanceMm.label, kind: "length", why: LIMIT_TERM.minRadialClearanceMm.hint },
  { key: "minDepthClearanceMm", label: LIMIT_TERM.minDepthClearanceMm.label, kind: "length", why: LIMIT_TERM.minDepthClearanceMm.hint },
  { key: "minSealingLandMm", label: LIMIT_TERM.minSealingLandMm.label, kind: "length", why: LIMIT_TERM.minSealingLandMm.hint },
  { key: "minWallMm", label: LIMIT_TERM.minWallMm.label, kind: "length", why: LIMIT_TERM.minWallMm.hint },
  { key: "minCrankClearanceMm", label: LIMIT_TERM.minCrankClearanceMm.label, kind: "length", why: LIMIT_TERM.minCrankClearanceMm.hint },
  { key: "studToleranceMm", label: LIMIT_TERM.studToleranceMm.label, kind: "length", why: LIMIT_TERM.studToleranceMm.hint },
  { key: "hardwareMarginMm", label: LIMIT_TERM.hardwareMarginMm.label, kind: "length", why: LIMIT_TERM.hardwareMarginMm.hint },
  { key: "maxRockMm", label: LIMIT_TERM.maxRockMm.label, kind: "length", why: LIMIT_TERM.maxRockMm.hint },
  { key: "cuttingSpeedMinMPerMin", label: LIMIT_TERM.cuttingSpeedMinMPerMin.label, kind: "speed", why: LIMIT_TERM.cuttingSpeedMinMPerMin.hint },
  { key: "cuttingSpeedMaxMPerMin", label: LIMIT_TERM.cuttingSpeedMaxMPerMin.label, kind: "speed", why: LIMIT_TERM.cuttingSpeedMaxMPerMin.hint },
  { key: "displacementClassesCc", label: LIMIT_TERM.displacementClassesCc.label, kind: "classes", why: LIMIT_TERM.displacementClassesCc.hint },
];

type Limits = Record<LengthKey | SpeedKey, number> & { displacementClassesCc: number[] };

const round = (v: number, places: number) => String(Math.round(v * 10 ** places) / 10 ** places);

function show(key: Key, value: number | number[], units: "mm" | "in"): string {
  if (Array.isArray(value)) return value.join(", ");
  const field = FIELDS.find((f) => f.key === key);
  return field?.kind === "length" && units === "in" ? round(mmToIn(value), 4) : round(value, 3);
}

/** The reason a typed value cannot be used, or the value in the core's units. */
function read(key: Key, text: string, units: "mm" | "in"): { value?: number | number[]; error?: string } {
  const field = FIELDS.find((f) => f.key === key)!;
  if (/\d,\d/.test(text) && field.kind !== "classes") return { error: `Use a point for decimals: ${text.replace(",", ".")}` };
  if (field.kind === "classes") {
    const parts = text.split(/[,\s]+/).filter(Boolean).map(Number);
    if (parts.some((n) => !Number.isFinite(n) || n <= 0)) return { error: "List positive numbers of cc, separated by commas: 50, 125" };
    return { value: parts };
  }
  const n = Number(text.trim());
  if (!text.trim() || !Number.isFinite(n)) return { error: "Enter a number." };
  if (n < 0) return { error: "It cannot be negative." };
  const value = field.kind === "length" && units === "in" ? inToMm(n) : n;
  if (field.kind === "length" && value > 100) return { error: "That is more than 100 mm; check the units." };
  if (field.kind === "speed" && (value <= 0 || value > 5000)) return { error: "Between 1 and 5000 m/min." };
  return { value };
}

export function LimitsForm({ limits, defaulted, version, units }: { limits: Limits; defaulted: string[]; version: number; units: "mm" | "in" }) {
  const router = useRouter();
  const [texts, setTexts] = useState<Record<Key, string>>(() =>
    Object.fromEntries(FIELDS.map((f) => [f.key, show(f.key, limits[f.key], units)])) as Record<Key, string>,
  );
  const [useDefault, setUseDefault] = useState<Record<Key, boolean>>(() => Object.fromEntries(FIELDS.map((f) => [f.key, defaulted.includes(f.key)])) as Record<Key, boolean>);
  const [notice, setNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  const errors = Object.fromEntries(FIELDS.map((f) => [f.key, useDefault[f.key] ? undefined : read(f.key, texts[f.key], units).error])) as Record<Key, string | undefined>;
  const speedOrder =
    !errors.cuttingSpeedMinMPerMin && !errors.cuttingSpeedMaxMPerMin && Number(texts.cuttingSpeedMinMPerMin) > Number(texts.cuttingSpeedMaxMPerMin)
      ? "The lowest cutting speed is above the highest."
      : undefined;
  const invalid = Object.values(errors).some(Boolean) || Boolean(speedOrder);

  async function save() {
    if (invalid) return;
    setBusy(true);
    const own: Record<string, number | number[]> = {};
    for (const f of FIELDS) if (!useDefault[f.key]) own[f.key] = read(f.key, texts[f.key], units).value!;
    const result = await callApi("/api/v1/settings", { method: "PATCH", body: { version, limits: own } });
    setBusy(false);
    if (!result.ok) {
      setNotice({ tone: "error", text: result.status === 409 ? "Someone else changed the settings meanwhile. Reload to see their change; what you typed is still here." : result.error.message });
      return;
    }
    setNotice({ tone: "ok", text: "Saved. New studies and every open study use these limits." });
    router.refresh();
  }

  return (
    <form
      aria-label="Default limits"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        void save();
      }}
      className="mt-4 flex flex-col gap-4"
    >
      <p className="text-sm text-ink-2">
        No published source gives these numbers: they are the shop&apos;s own. A limit marked <em>default</em> follows Borewright&apos;s starting value.
        Lengths in {units}.
      </p>
      <div className="grid gap-4 md:grid-cols-2">
        {FIELDS.map((f) => {
          const id = `limit-${f.key}`;
          const unit = f.kind === "length" ? units : f.kind === "speed" ? "m/min" : "cc";
          return (
            <div key={f.key}>
              <label htmlFor={id} className="field-label">
                {f.label} <span className="num text-ink-3">({unit})</span>
              </label>
              <div className="mt-1 flex items-center gap-3">
                <input
                  id={id}
                  className="field-input mt-0 num"
                  inputMode={f.kind === "classes" ? "text" : "decimal"}
                  value={useDefault[f.key] ? show(f.key, DEFAULT_LIMITS[f.key] as number | number[], units) : texts[f.key]}
                  disabled={useDefault[f.key]}
                  aria-invalid={errors[f.key] ? true : undefined}
                  aria-describedby={`${id}-hint`}
                  onChange={(e) => setTexts((t) => ({ ...t, [f.key]: e.target.value }))}
                />
                <label className="flex shrink-0 items-center gap-1 text-sm text-ink-2">
                  <input
                    type="checkbox"
                    checked={useDefault[f.key]}
                    onChange={(e) => {
                      const on = e.target.checked;
                      setUseDefault((d) => ({ ...d, [f.key]: on }));
                      if (!on) setTexts((t) => ({ ...t, [f.key]: show(f.key, DEFAULT_LIMITS[f.key] as number | number[], units) }));
                    }}
                  />
                  default
                </label>
              </div>
              {errors[f.key] || (f.key === "cuttingSpeedMaxMPerMin" && speedOrder) ? (
                <p role="alert" className="field-error">
                  {errors[f.key] ?? speedOrder}
                </p>
              ) : (
                <p id={`${id}-hint`} className="field-hint">
                  {f.why}
                </p>
              )}
            </div>
          );
        })}
      </div>
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
      <button type="submit" className="btn self-start" disabled={busy || invalid}>
        {busy ? "Saving…" : "Save the limits"}
      </button>
    </form>
  );
}
