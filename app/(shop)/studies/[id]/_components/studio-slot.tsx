"use client";

import { useCallback } from "react";
import { useFormContext } from "react-hook-form";
import { mmToIn, type LengthUnits, type Study, type StudyResult } from "@/geometry";
import { Studio } from "@/app/_ui/studio/studio";
import type { StudyFormValues } from "./study-values";

export type StudioSlotProps = { study: Study; result: StudyResult; kitId: string | null; units: LengthUnits };

const asText = (mm: number, units: LengthUnits) => String(units === "in" ? Math.round(mmToIn(mm) * 10_000) / 10_000 : Math.round(mm * 1000) / 1000);

/** The fit studio on the study page: a cut set in the studio lands in the plan's fields, which save as usual. */
export function StudioSlot({ study, result, kitId, units }: StudioSlotProps) {
  const form = useFormContext<StudyFormValues>();
  const onCutChange = useCallback(
    (cut: { diameterMm?: number; depthMm?: number }, final: boolean) => {
      if (!final) return;
      const opts = { shouldDirty: true, shouldValidate: true } as const;
      if (cut.diameterMm !== undefined) form.setValue("cut.diameterMm", asText(cut.diameterMm, units), opts);
      if (cut.depthMm !== undefined) form.setValue("cut.depthMm", asText(cut.depthMm, units), opts);
    },
    [form, units],
  );
  return <Studio study={study} result={result} units={units} onCutChange={onCutChange} chosenKitId={kitId ?? undefined} />;
}
