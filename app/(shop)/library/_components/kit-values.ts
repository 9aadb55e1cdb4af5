import type { LengthUnits } from "@/geometry";
import type { KitRow } from "../../../_ui/query/types";
import type { FormReader } from "@/app/_ui/form/form-reader";
import { lengthText, numberText } from "@/app/_ui/form/number-text";
import { readStuds, studsText } from "@/app/_ui/form/read-shapes";
import type { StudText } from "@/app/_ui/form/text-values";

export type KitFormValues = {
  name: string;
  notes: string;
  boreMm: string;
  strokeMm: string;
  skirtDiameterReadingsMm: string[];
  skirtLengthReadingsMm: string[];
  studs: StudText[];
  studThread: string;
  baseGasketsMm: string[];
  alwaysWithGasket: boolean;
  price: string;
};

export function kitDefaults(row: KitRow | null, units: LengthUnits): KitFormValues {
  const d = row?.data;
  const list = (v: readonly number[] | undefined) => (v && v.length ? v.map((x) => lengthText(x, units)) : [""]);
  return {
    name: row?.name ?? "",
    notes: row?.notes ?? "",
    boreMm: lengthText(d?.boreMm, units),
    strokeMm: lengthText(d?.strokeMm, units),
    skirtDiameterReadingsMm: list(d?.skirtDiameterReadingsMm),
    skirtLengthReadingsMm: list(d?.skirtLengthReadingsMm),
    studs: d ? studsText(d.studs, units) : [],
    studThread: d?.studThread ?? "",
    baseGasketsMm: d?.baseGasketsMm?.map((x) => lengthText(x, units)) ?? [],
    alwaysWithGasket: d?.alwaysWithGasket ?? false,
    price: numberText(d?.price),
  };
}

/** The form's texts as the core's CylinderKit input (with a stand-in id; the row's id is the kit's id). */
export function kitToCore(v: KitFormValues, read: FormReader): unknown {
  const readings = (key: "skirtDiameterReadingsMm" | "skirtLengthReadingsMm") => {
    const texts = (v[key] ?? []).filter((t, i, all) => t.trim() !== "" || all.length === 1);
    return read.lengths(texts, [key]);
  };
  return {
    id: "draft",
    name: v.name,
    boreMm: read.length(v.boreMm, ["boreMm"]),
    strokeMm: read.length(v.strokeMm, ["strokeMm"]),
    skirtDiameterReadingsMm: readings("skirtDiameterReadingsMm"),
    skirtLengthReadingsMm: readings("skirtLengthReadingsMm"),
    studs: readStuds(v.studs, read),
    studThread: read.optionalText(v.studThread),
    baseGasketsMm: read.lengths(v.baseGasketsMm, ["baseGasketsMm"]),
    alwaysWithGasket: v.alwaysWithGasket,
    price: read.number(v.price, ["price"]),
  };
}
