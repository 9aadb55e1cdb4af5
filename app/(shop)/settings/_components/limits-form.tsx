"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { DEFAULT_LIMITS } from "@/geometry";
import { callApi } from "../../../_ui/api-client";
import { FormNotice } from "../../../_ui/field";
import { FIELDS, type Key, type Limits, read, show } from "./limit-fields";

type Units = "mm" | "in";
const defaultText = (key: Key, units: Units) => show(key, DEFAULT_LIMITS[key] as number | number[], units);

/** The limits form's state: each limit's text or "default", what is wrong with them, and the save. */
function useLimitsForm({ limits, defaulted, version, units }: { limits: Limits; defaulted: string[]; version: number; units: Units }) {
  const router = useRouter();
  const [texts, setTexts] = useState<Record<Key, string>>(() => Object.fromEntries(FIELDS.map((f) => [f.key, show(f.key, limits[f.key], units)])) as Record<Key, string>);
  const [useDefault, setUseDefault] = useState<Record<Key, boolean>>(() => Object.fromEntries(FIELDS.map((f) => [f.key, defaulted.includes(f.key)])) as Record<Key, boolean>);
  const [notice, setNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  const errors = Object.fromEntries(FIELDS.map((f) => [f.key, useDefault[f.key] ? undefined : read(f.key, texts[f.key], units).error])) as Record<Key, string | undefined>;
  const speedOrder =
    !errors.cuttingSpeedMinMPerMin && !errors.cuttingSpeedMaxMPerMin && Number(texts.cuttingSpeedMinMPerMin) > Number(texts.cuttingSpeedMaxMPerMin)
      ? "The lowest cutting speed is above the highest."
      : undefined;
  const invalid = Object.values(errors).some(Boolean) || Boolean(speedOrder);

  const setText = (key: Key, text: string) => setTexts((t) => ({ ...t, [key]: text }));
  const setDefault = (key: Key, on: boolean) => {
    setUseDefault((d) => ({ ...d, [key]: on }));
    if (!on) setText(key, defaultText(key, units));
  };

  async function save() {
    if (invalid) return;
    setBusy(true);
    const own: Record<string, number | number[]> = {};
    for (const f of FIELDS) {
      const value = useDefault[f.key] ? undefined : read(f.key, texts[f.key], units).value;
      if (value !== undefined) own[f.key] = value;
    }
    const result = await callApi("/api/v1/settings", { method: "PATCH", body: { version, limits: own } });
    setBusy(false);
    if (!result.ok) {
      setNotice({ tone: "error", text: result.status === 409 ? "Someone else changed the settings meanwhile. Reload to see their change; what you typed is still here." : result.error.message });
      return;
    }
    setNotice({ tone: "ok", text: "Saved. New studies and every open study use these limits." });
    router.refresh();
  }

  return { texts, useDefault, errors, speedOrder, invalid, setText, setDefault, notice, busy, save };
}

/** The shop's own limits, each with its reason; a limit left on "default" follows the core's starting value. */
export function LimitsForm(props: { limits: Limits; defaulted: string[]; version: number; units: Units }) {
  const { units } = props;
  const f = useLimitsForm(props);
  return (
    <form
      aria-label="Default limits"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        void f.save();
      }}
      className="mt-4 flex flex-col gap-4"
    >
      <p className="text-sm text-ink-2">
        No published source gives these numbers: they are the shop&apos;s own. A limit marked <em>default</em> follows Borewright&apos;s starting value.
        Lengths in {units}.
      </p>
      <div className="grid gap-4 md:grid-cols-2">
        {FIELDS.map((field) => (
          <LimitField
            key={field.key}
            field={field}
            units={units}
            text={f.useDefault[field.key] ? defaultText(field.key, units) : f.texts[field.key]}
            isDefault={f.useDefault[field.key]}
            error={f.errors[field.key] ?? (field.key === "cuttingSpeedMaxMPerMin" ? f.speedOrder : undefined)}
            onText={(text) => f.setText(field.key, text)}
            onDefault={(on) => f.setDefault(field.key, on)}
          />
        ))}
      </div>
      {f.notice ? <FormNotice tone={f.notice.tone}>{f.notice.text}</FormNotice> : null}
      <button type="submit" className="btn self-start" disabled={f.busy || f.invalid}>
        {f.busy ? "Saving…" : "Save the limits"}
      </button>
    </form>
  );
}

function LimitField({ field: f, units, text, isDefault, error, onText, onDefault }: {
  field: (typeof FIELDS)[number];
  units: Units;
  text: string;
  isDefault: boolean;
  error: string | undefined;
  onText: (text: string) => void;
  onDefault: (on: boolean) => void;
}) {
  const id = `limit-${f.key}`;
  const unit = f.kind === "length" ? units : f.kind === "speed" ? "m/min" : "cc";
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {f.label} <span className="num text-ink-3">({unit})</span>
      </label>
      <div className="mt-1 flex items-center gap-3">
        <input
          id={id}
          className="field-input mt-0 num"
          inputMode={f.kind === "classes" ? "text" : "decimal"}
          value={text}
          disabled={isDefault}
          aria-invalid={error ? true : undefined}
          aria-describedby={`${id}-hint`}
          onChange={(e) => onText(e.target.value)}
        />
        <label className="flex shrink-0 items-center gap-1 text-sm text-ink-2">
          <input type="checkbox" checked={isDefault} onChange={(e) => onDefault(e.target.checked)} />
          default
        </label>
      </div>
      {error ? (
        <p role="alert" className="field-error">
          {error}
        </p>
      ) : (
        <p id={`${id}-hint`} className="field-hint">
          {f.why}
        </p>
      )}
    </div>
  );
}
