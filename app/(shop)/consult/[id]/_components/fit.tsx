"use client";

import { Suspense } from "react";
import type { Study, StudyResult } from "@/geometry";
import { Studio } from "@/app/_ui/studio/studio";

/**
 * The studio's large-type customer mode, locked (no way to the bench view and its cut controls), showing the shop's choice.
 * In its own boundary, so React brings it to life in short steps after the rest of the page.
 */
export function FitForCustomer(props: { study: Study; result: StudyResult; units: "mm" | "in"; chosenKitId: string }) {
  return (
    <Suspense>
      <Studio study={props.study} result={props.result} units={props.units} customerMode lockCustomerMode chosenKitId={props.chosenKitId} />
    </Suspense>
  );
}
