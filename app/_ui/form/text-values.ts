// The text shapes the forms keep (numbers as typed), mirroring the core's input paths.

export type PairText = [string, string];

export type OutlineText = {
  kind: "circle" | "polygon";
  diameterMm: string;
  centerMm: PairText;
  pointsMm: PairText[];
};

export type StudText = { label: string; positionMm: PairText };

export const emptyOutline = (kind: OutlineText["kind"] = "circle"): OutlineText => ({ kind, diameterMm: "", centerMm: ["", ""], pointsMm: [] });
