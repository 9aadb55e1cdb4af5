"use client";

import type { LengthUnits } from "@/geometry";
import { FormNotice } from "../field";
import { UnitToggle } from "./unit-toggle";

/** A library form's top: its title, the form's units switch, and what the last save said. */
export function FormHeading({ title, units, onUnits, notice }: { title: string; units: LengthUnits; onUnits: (u: LengthUnits) => void; notice: { tone: "error" | "ok"; text: string } | null }) {
  return (
    <>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-semibold">{title}</h1>
        <UnitToggle units={units} onChange={onUnits} />
      </div>
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
    </>
  );
}
