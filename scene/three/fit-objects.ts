import { BufferGeometry, type Camera, DoubleSide, Float32BufferAttribute, Group, Line, LineBasicMaterial, Mesh, MeshLambertMaterial, Plane } from "three";
import { FIT, printed, SCENE, SURFACE } from "@/model/palette";
import { cutGeometry, fitState, interferenceBandGeometry, interferenceRegions, type InterferenceBand } from "../fit-model";
import type { FitSnapshot } from "../store";
import { placeLabels, STATE_3D } from "./fit-labels";
import { Label } from "./label";
import { disposeOverlay, portOverlay, PortOverlayMaterials } from "./port-overlay";
import { sectionNormal, type ViewState } from "./view";

const INK = SURFACE.ink.light;

/**
 * Whether two snapshots draw the same picture in a view: the same study and kit on show with the same result
 * for it, and the other kits' skirts hidden (no overlay), so only their unseen colours could differ. The
 * other kits' results arriving after a slider step is such a change: no new frame is drawn for it.
 */
export function drawsTheSame(a: FitSnapshot, b: FitSnapshot, view: ViewState): boolean {
  if (view.overlay || a.study !== b.study || a.kitIndex !== b.kitIndex || a.result.kits[a.kitIndex] !== b.result.kits[b.kitIndex]) return false;
  // The colour of the kit on show also reads the tolerance and the shop's minimum clearance.
  return a.result.toleranceMm === b.result.toleranceMm && a.result.limits.values.minRadialClearanceMm === b.result.limits.values.minRadialClearanceMm;
}

/**
 * The parts of the fit view that follow every slider step: the cut and interference solids, the skirt
 * colours, the thinnest-wall mark and the labels. Updated in place from the store inside useFrame; the
 * labels are HTML over the canvas, placed after the camera each frame.
 */
export class FitObjects {
  readonly plane = new Plane();
  readonly materials;
  readonly skirtMaterials: MeshLambertMaterial[] = [];
  readonly labels = { skirt: new Label(), cut: new Label(), wall: new Label(), hit: new Label() };
  readonly wallLine: Line;
  readonly cut: Mesh;
  /** The interference beside the cut (rebuilt with every step) and below it (kept while its band is the same). */
  readonly hit: Mesh;
  readonly hitBelow: Mesh;
  /** The kit's port windows over the case's passages at the deck (empty for a kit without them). */
  readonly ports = new Group();
  readonly portMaterials: PortOverlayMaterials;
  private applied: { snap: FitSnapshot | null; view: ViewState | null; kit: unknown } = { snap: null, view: null, kit: null };
  /** What the port overlay was drawn from: the case's pockets, the kit and the core's verdict on each window. */
  private portsFrom: { pockets: unknown; kit: unknown; verdicts: string } = { pockets: null, kit: null, verdicts: "" };
  /** The band the interference below the cut was built from. */
  private belowFrom: InterferenceBand | null = null;
  private view: ViewState | null = null;

  constructor() {
    const clip = [this.plane];
    this.materials = {
      case: new MeshLambertMaterial({ color: SCENE.caseMetal, side: DoubleSide, clippingPlanes: clip }),
      cut: new MeshLambertMaterial({ color: printed(FIT.counterbore), transparent: true, opacity: 0.28, depthWrite: false, side: DoubleSide, clippingPlanes: clip }),
      flange: new MeshLambertMaterial({ color: SCENE.flange, side: DoubleSide, clippingPlanes: clip }),
      gasket: new MeshLambertMaterial({ color: SCENE.gasket, side: DoubleSide, clippingPlanes: clip }),
      interference: new MeshLambertMaterial({ color: printed(FIT.interfere), emissive: SCENE.interferenceGlow, side: DoubleSide, clippingPlanes: clip }),
      wall: new LineBasicMaterial({ color: INK, depthTest: false }),
    };
    this.portMaterials = new PortOverlayMaterials(clip);
    this.ports.name = "port-overlay";
    const g = new BufferGeometry();
    g.setAttribute("position", new Float32BufferAttribute(new Float32Array(6), 3));
    this.wallLine = new Line(g, this.materials.wall);
    this.wallLine.renderOrder = 9;
    this.cut = new Mesh(new BufferGeometry(), this.materials.cut);
    this.cut.renderOrder = 2;
    this.hit = new Mesh(new BufferGeometry(), this.materials.interference);
    this.hit.renderOrder = 1;
    this.hitBelow = new Mesh(new BufferGeometry(), this.materials.interference);
    this.hitBelow.renderOrder = 1;
  }

  /** The material of kit i's skirt (made on first use). */
  skirtMaterial(i: number): MeshLambertMaterial {
    while (this.skirtMaterials.length <= i) {
      this.skirtMaterials.push(new MeshLambertMaterial({ color: STATE_3D.clear, side: DoubleSide, clippingPlanes: [this.plane], transparent: true }));
    }
    return this.skirtMaterials[i];
  }

  /** Sets the section plane (through the axis, at an angle in the plan), or keeps everything when off. */
  setView(view: ViewState) {
    this.view = view;
    if (view.section) {
      sectionNormal(view.sectionAngleDeg, this.plane.normal);
      this.plane.constant = 0;
    } else {
      this.plane.normal.set(0, 1, 0);
      this.plane.constant = 1e6;
    }
    this.ports.visible = view.ports !== false;
  }

  /** Brings the fast-changing parts up to the snapshot; does nothing when neither it nor the view changed. */
  apply(snap: FitSnapshot) {
    const v = this.view;
    if (!v || (this.applied.snap === snap && this.applied.view === v)) return;
    const { result, study } = snap;
    const k = result.kits[snap.kitIndex];
    const kitChanged = k !== this.applied.kit || v !== this.applied.view;
    this.applied = { snap, view: v, kit: k };
    this.colourSkirts(snap);
    // The rest depends only on the kit on show: skip it when only the other kits' results arrived.
    if (!kitChanged) return;
    const cutGeom = cutGeometry(k, v.exaggeration, this.cut.geometry);
    if (cutGeom !== this.cut.geometry) {
      this.cut.geometry.dispose();
      this.cut.geometry = cutGeom ?? new BufferGeometry();
    }
    const bands = interferenceRegions(study, k, { ringsInAnyOrder: true });
    const beside = bands.find((b) => b.part === "beside-cut");
    const hitGeom = beside ? interferenceBandGeometry(beside, this.hit.geometry) : new BufferGeometry();
    if (hitGeom !== this.hit.geometry) {
      this.hit.geometry.dispose();
      this.hit.geometry = hitGeom;
    }
    this.drawBelow(bands.find((b) => b.part === "below-cut") ?? null);
    this.drawPorts(snap);

    placeLabels(this.labels, this.wallLine, snap, v, bands.length > 0);
  }

  /** Rebuilds the interference below the cut when its band changed (not while only the cut's diameter is dragged). */
  private drawBelow(band: InterferenceBand | null) {
    const was = this.belowFrom;
    if (band === was || (band && was && band.regions === was.regions && band.z0 === was.z0 && band.z1 === was.z1)) return;
    this.belowFrom = band;
    this.hitBelow.geometry.dispose();
    this.hitBelow.geometry = band ? interferenceBandGeometry(band) : new BufferGeometry();
  }

  /** Redraws the port overlay when what it is drawn from changed (a cut being dragged seldom changes it). */
  private drawPorts({ study, result, kitIndex }: FitSnapshot) {
    const from = { pockets: study.case.pockets, kit: study.kits[kitIndex], verdicts: result.kits[kitIndex].ports.map((p) => `${p.portLabel}:${p.ok}`).join("|") };
    const was = this.portsFrom;
    if (from.pockets === was.pockets && from.kit === was.kit && from.verdicts === was.verdicts) return;
    this.portsFrom = from;
    for (const g of this.ports.children) disposeOverlay(g as Group);
    this.ports.clear();
    this.ports.add(portOverlay(study, kitIndex, result.kits[kitIndex], this.portMaterials));
  }

  /** Puts each label where its anchor is seen in a view of `width` × `height` CSS px. */
  placeLabelsOnScreen(camera: Camera, width: number, height: number) {
    camera.updateMatrixWorld();
    for (const l of Object.values(this.labels)) l.place(camera, width, height);
  }

  /** Draws the labels as shown into a 2D context of the view (for a snapshot). */
  drawLabels(ctx: CanvasRenderingContext2D, dpr: number) {
    for (const l of Object.values(this.labels)) l.drawInto(ctx, dpr);
  }

  private colourSkirts({ result, kitIndex }: FitSnapshot) {
    result.kits.forEach((kr, i) => {
      const m = this.skirtMaterial(i);
      m.color.set(STATE_3D[fitState(kr, result)]);
      const ghost = i !== kitIndex;
      m.opacity = ghost ? 0.35 : 1;
      m.depthWrite = !ghost;
    });
  }

  dispose() {
    Object.values(this.materials).forEach((m) => m.dispose());
    this.skirtMaterials.forEach((m) => m.dispose());
    Object.values(this.labels).forEach((l) => l.dispose());
    this.wallLine.geometry.dispose();
    this.cut.geometry.dispose();
    this.hit.geometry.dispose();
    this.hitBelow.geometry.dispose();
    for (const g of this.ports.children) disposeOverlay(g as Group);
    this.portMaterials.dispose();
  }
}
