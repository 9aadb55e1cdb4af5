import type { EditShapes } from "@/scene/drawing/plan-edit";

/** Invented shapes being entered: a square deck, a round mouth, four studs (the last not readable yet) and one passage. */
export const squareDeckShapes = (): EditShapes => ({
  deck: { kind: "polygon", pointsMm: [[-50, -50], [50, -50], [50, 50], [-50, 50]] },
  mouth: { kind: "circle", diameterMm: 46 },
  studs: [
    { label: "front left", positionMm: [-35, -35] },
    { label: "front right", positionMm: [35, -35] },
    { label: "rear right", positionMm: [35, 35] },
    null,
  ],
  studHoleDiameterMm: 8.5,
  pockets: [{ label: "transfer", outline: { kind: "polygon", pointsMm: [[20, -5], [30, -5], [30, 5]] }, startDepthMm: 0 }],
});
