"use client";

import type { Study, StudyResult } from "@/geometry";
import { Studio } from "@/app/_ui/studio/studio";

/** The studio's large-type customer mode, locked (no way to the bench view and its cut controls), showing the shop's choice. */
export function FitForCustomer(props: { study: Study; result: StudyResult; units: "mm" | "in"; chosenKitId: string }) {
  return <Studio study={props.study} result={props.result} units={props.units} customerMode lockCustomerMode chosenKitId={props.chosenKitId} />;
}
