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
