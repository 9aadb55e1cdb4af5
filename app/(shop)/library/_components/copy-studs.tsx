"use client";

import type { LengthUnits } from "@/geometry";
import { useFormContext } from "react-hook-form";
import { useLibraryOptions } from "../../../_ui/query/library/use-library-list";
import { studsText } from "@/app/_ui/form/read-shapes";
import { RowOptions } from "@/app/_ui/form/row-options";

/** Copies a case profile's studs into the kit, for a kit made for that stud pattern. */
export function CopyStudsFromCase({ units }: { units: LengthUnits }) {
  const { setValue, getValues } = useFormContext();
  const cases = useLibraryOptions("cases");
  const items = cases.data?.items ?? [];
  if (items.length === 0) return null;
  return (
    <label className="flex min-w-0 max-w-full flex-wrap items-center gap-2 text-sm">
      <span className="text-ink-2">Copy from a case</span>
      <select
        className="min-w-0 max-w-full rounded-md border border-rule bg-card px-2 py-1.5"
        value=""
        aria-label="Copy studs from a case profile"
        onChange={(e) => {
          const c = items.find((x) => x.id === e.target.value);
          if (!c) return;
          setValue("studs", studsText(c.data.studs, units), { shouldDirty: true, shouldValidate: true });
          // The case's stud thread goes with its studs, unless the kit already names one.
          if (c.data.studThread && !String(getValues("studThread") ?? "").trim()) setValue("studThread", c.data.studThread, { shouldDirty: true, shouldValidate: true });
        }}
      >
        <RowOptions rows={items} empty="choose…" />
      </select>
    </label>
  );
}
