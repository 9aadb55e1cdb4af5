import type { LengthUnits } from "@/geometry";
import type { RigRow } from "../../../_ui/query/types";
import type { FormReader } from "@/app/_ui/form/form-reader";
import { lengthFieldText, numberFieldText } from "@/model/units";

export type RigFormValues = {
  name: string;
  notes: string;
  headDiameterMm: string;
  bitLengthMm: string;
  calibration: { bitLengthMm: string; minCutDiameterMm: string; maxCutDiameterMm: string };
  hardwareRadiusMm: string;
  grooves: { label: string; travelMm: string }[];
  shims: { thicknessMm: string; count: string }[];
  drillTopRpm: string;
  settingResolutionMm: string;
  studThread: string;
};

export function rigDefaults(row: RigRow | null, units: LengthUnits): RigFormValues {
  const d = row?.data;
  const L = (v: number | undefined) => lengthFieldText(v, units);
  return {
    name: row?.name ?? "",
    notes: row?.notes ?? "",
    headDiameterMm: L(d?.headDiameterMm),
    bitLengthMm: L(d?.bitLengthMm),
    calibration: { bitLengthMm: L(d?.calibration.bitLengthMm), minCutDiameterMm: L(d?.calibration.minCutDiameterMm), maxCutDiameterMm: L(d?.calibration.maxCutDiameterMm) },
    hardwareRadiusMm: L(d?.hardwareRadiusMm),
    grooves: d?.grooves.map((g) => ({ label: g.label, travelMm: L(g.travelMm) })) ?? [{ label: "groove 1", travelMm: "" }],
    shims: d?.shims?.map((s) => ({ thicknessMm: L(s.thicknessMm), count: numberFieldText(s.count) })) ?? [],
    drillTopRpm: numberFieldText(d?.drillTopRpm),
    settingResolutionMm: L(d?.settingResolutionMm),
    studThread: d?.studThread ?? "",
  };
}

/** The form's texts as the core's BoringRig input. */
export function rigToCore(v: RigFormValues, read: FormReader): unknown {
  return {
    name: v.name,
    headDiameterMm: read.length(v.headDiameterMm, ["headDiameterMm"]),
    bitLengthMm: read.length(v.bitLengthMm, ["bitLengthMm"]),
    calibration: {
      bitLengthMm: read.length(v.calibration.bitLengthMm, ["calibration", "bitLengthMm"]),
      minCutDiameterMm: read.length(v.calibration.minCutDiameterMm, ["calibration", "minCutDiameterMm"]),
      maxCutDiameterMm: read.length(v.calibration.maxCutDiameterMm, ["calibration", "maxCutDiameterMm"]),
    },
    hardwareRadiusMm: read.length(v.hardwareRadiusMm, ["hardwareRadiusMm"]),
    grooves: (v.grooves ?? []).map((g, i) => ({ label: g.label.trim(), travelMm: read.length(g.travelMm, ["grooves", i, "travelMm"]) })),
    shims: (v.shims ?? []).map((s, i) => ({ thicknessMm: read.length(s.thicknessMm, ["shims", i, "thicknessMm"]), count: read.number(s.count, ["shims", i, "count"]) })),
    drillTopRpm: read.number(v.drillTopRpm, ["drillTopRpm"]),
    settingResolutionMm: read.length(v.settingResolutionMm, ["settingResolutionMm"]),
    studThread: read.optionalText(v.studThread),
  };
}
