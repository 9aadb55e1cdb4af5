"use client";

import type { LengthUnits } from "@/geometry";
import { useFormContext, useWatch } from "react-hook-form";
import { TextField } from "@/app/_ui/form/text-field";
import { LIMIT_TERM } from "@/model/glossary";
import { lengthLabel, speedLabel } from "@/model/units";
import { LIMIT_KEYS, type LimitKey, type StudyFormValues } from "./study-values";

/** Each limit's name, the same as in the shop's settings (model/glossary.ts). */
export const LIMIT_LABEL: Record<LimitKey, string> = Object.fromEntries(LIMIT_KEYS.map((k) => [k, LIMIT_TERM[k].label])) as Record<LimitKey, string>;

/** The study's own limits; a blank one takes the shop's default, shown beside it. */
export function LimitsPanel({ units, shopLimits }: { units: LengthUnits; shopLimits: Record<string, unknown> }) {
  const { control } = useFormContext<StudyFormValues>();
  const values = useWatch({ control, name: "limits" });
  const shopText = (k: LimitKey) => {
    const v = shopLimits[k];
    if (Array.isArray(v)) return `${v.join(", ")} cc`;
    if (typeof v !== "number") return "—";
    return k.endsWith("Mm") ? lengthLabel(v, units) : speedLabel(v, units);
  };
  return (
    <section className="card flex flex-col gap-3 p-4" aria-label="Limits">
      <h2 className="font-semibold">Limits</h2>
      <p className="text-sm text-ink-2">Blank takes the shop&apos;s default. Set one here to change it for this study only.</p>
      <div className="grid gap-3 sm:grid-cols-2">
        {LIMIT_KEYS.map((k) => {
          const own = Boolean(values?.[k]?.trim());
          return (
            <TextField<StudyFormValues>
              key={k}
              name={`limits.${k}`}
              label={LIMIT_LABEL[k]}
              unit={k.endsWith("Mm") ? units : k === "displacementClassesCc" ? "cc" : "m/min"}
              numeric
              placeholder={shopText(k)}
              hint={own ? `This study's own; the shop default is ${shopText(k)}.` : `Shop default: ${shopText(k)}`}
            />
          );
        })}
      </div>
    </section>
  );
}
