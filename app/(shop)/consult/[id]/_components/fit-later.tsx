"use client";

import type { Study, StudyResult } from "@/geometry";
import { later } from "@/app/_ui/later";

const FitForCustomer = later(() => import("./fit").then((m) => m.FitForCustomer));

/** The fit for the customer: in the first HTML as the server rendered it, its code a script of its own, fetched with the page's first ones. */
export function FitForCustomerLater(props: { study: Study; result: StudyResult; units: "mm" | "in"; chosenKitId: string }) {
  return <FitForCustomer {...props} />;
}
