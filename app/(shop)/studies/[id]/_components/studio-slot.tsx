"use client";

import { memo, useCallback } from "react";
import { useFormContext } from "react-hook-form";
import type { Study, StudyResult } from "@/geometry";
import type { Money } from "@/model/money";
import { Studio } from "@/app/_ui/studio/studio";
import { lengthFieldText, type LengthUnits } from "@/model/units";
import type { StudyFormValues } from "./study-values";

/** The studio, rendered again only when what it is given changes (not on every render of the form around it). */
const MemoStudio = memo(Studio);

export type StudioSlotProps = { study: Study; result: StudyResult; kitId: string | null; units: LengthUnits; prices?: Readonly<Record<string, Money | undefined>> };

/**
 * The fit studio on the study page: a cut set in the studio lands in the plan's fields, which save as usual.
 * The least cut leaves the fields blank, so the cut stays "the least cut" and follows the readings.
 */
export function StudioSlot({ study, result, kitId, units, prices }: StudioSlotProps) {
  // setValue is the form's own, the same on every render, so the callback (and the studio) stay put.
  const { setValue } = useFormContext<StudyFormValues>();
  const onCutChange = useCallback(
    (cut: { diameterMm?: number; depthMm?: number }, final: boolean) => {
      if (!final) return;
      const opts = { shouldDirty: true, shouldValidate: true } as const;
      setValue("cut.diameterMm", lengthFieldText(cut.diameterMm, units), opts);
      setValue("cut.depthMm", lengthFieldText(cut.depthMm, units), opts);
    },
    [setValue, units],
  );
  return <MemoStudio study={study} result={result} units={units} onCutChange={onCutChange} chosenKitId={kitId ?? undefined} kitPrices={prices} />;
}
