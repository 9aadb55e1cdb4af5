import type { Outline } from "@/geometry/schema";

/**
 * Shapes a capture source (a photo trace, an imported drawing) hands to the case or kit-gasket form.
 * Every length is in millimetres, in the case's frame: origin on the cylinder axis at the deck.
 */
export type CapturedShapes = {
  deck?: Outline;
  mouth?: Outline;
  studs?: { label: string; positionMm: [number, number] }[];
  pockets?: { label: string; outline: Outline }[];
  ports?: { label: string; outline: Outline }[];
};

/**
 * The reference points a photo was scaled or squared up by, kept with the photo so a trace can go on later.
 * Points are in the original photo's pixels (upright, as shown); lengths in millimetres.
 * "scale": two points and the measured distance between them; "rectangle": four points of a measured
 * rectangle (e.g. four studs), `widthMm` across (x) and `heightMm` along (y).
 */
export type PhotoReference =
  | { kind: "scale"; points: [[number, number], [number, number]]; distanceMm: number }
  | { kind: "rectangle"; points: [[number, number], [number, number], [number, number], [number, number]]; widthMm: number; heightMm: number };
