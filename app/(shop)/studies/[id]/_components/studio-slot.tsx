"use client";

import { useCallback } from "react";
import { useFormContext } from "react-hook-form";
import type { Study, StudyResult } from "@/geometry";
import type { Money } from "@/model/money";
import { Studio } from "@/app/_ui/studio/studio";
import { lengthFieldText, type LengthUnits } from "@/model/units";
import type { StudyFormValues } from "./study-values";

export type StudioSlotProps = { study: Study; result: StudyResult; kitId: string | null; units: LengthUnits; prices?: Readonly<Record<string, Money | undefined>> };

/**
 * The fit studio on the study page: a cut set in the studio lands in the plan's fields, which save as usual.
 * The least cut leaves the fields blank, so the cut stays "the least cut" and follows the readings.
 */
export function StudioSlot({ study, result, kitId, units, prices }: StudioSlotProps) {
  const form = useFormContext<StudyFormValues>();
  const onCutChange = useCallback(
    (cut: { diameterMm?: number; depthMm?: number }, final: boolean) => {
      if (!final) return;
      const opts = { shouldDirty: true, shouldValidate: true } as const;
      form.setValue("cut.diameterMm", lengthFieldText(cut.diameterMm, units), opts);
      form.setValue("cut.depthMm", lengthFieldText(cut.depthMm, units), opts);
    },
    [form, units],
  );
  return <Studio study={study} result={result} units={units} onCutChange={onCutChange} chosenKitId={kitId ?? undefined} kitPrices={prices} />;
}
