import { BufferGeometry, DoubleSide, Float32BufferAttribute, Line, LineBasicMaterial, Mesh, MeshLambertMaterial, Plane } from "three";
import { cutGeometry, FLANGE_DRAWN_MM, fitState, flangeRadiusMm, governingClearanceMm, interferenceGeometry } from "../fit-model";
import { diameterLabel, lengthLabel, signedLengthLabel } from "@/model/units";
import { toWorld } from "../solids";
import type { FitSnapshot } from "../store";
import { Label } from "./label";
import { sectionNormal, type ViewState } from "./view";

export const STATE_3D = { interfere: "#c0392b", tight: "#c8861f", clear: "#13776f" } as const;
const LABEL_MM = 4.2;
const LABEL_CUSTOMER_MM = 7.5;

/**
 * The parts of the fit view that follow every slider step: the cut and interference solids, the skirt
 * colours, the thinnest-wall mark and the labels. Updated in place from the store inside useFrame.
 */
export class FitObjects {
  readonly plane = new Plane();
  readonly materials;
  readonly skirtMaterials: MeshLambertMaterial[] = [];
  readonly labels = { skirt: new Label(), cut: new Label(), wall: new Label(), hit: new Label() };
  readonly wallLine: Line;
  readonly cut: Mesh;
  readonly hit: Mesh;
  private applied: { snap: FitSnapshot | null; view: ViewState | null; kit: unknown } = { snap: null, view: null, kit: null };
  private view: ViewState | null = null;

  constructor() {
    const clip = [this.plane];
    this.materials = {
      case: new MeshLambertMaterial({ color: "#bdb7aa", side: DoubleSide, clippingPlanes: clip }),
      cut: new MeshLambertMaterial({ color: "#2a8f88", transparent: true, opacity: 0.28, depthWrite: false, side: DoubleSide, clippingPlanes: clip }),
      flange: new MeshLambertMaterial({ color: "#8f969b", side: DoubleSide, clippingPlanes: clip }),
      gasket: new MeshLambertMaterial({ color: "#d8b262", side: DoubleSide, clippingPlanes: clip }),
      interference: new MeshLambertMaterial({ color: "#e0301e", emissive: "#5a0a04", side: DoubleSide, clippingPlanes: clip }),
      wall: new LineBasicMaterial({ color: "#2b2f33", depthTest: false }),
    };
    const g = new BufferGeometry();
    g.setAttribute("position", new Float32BufferAttribute(new Float32Array(6), 3));
    this.wallLine = new Line(g, this.materials.wall);
    this.wallLine.renderOrder = 9;
    this.cut = new Mesh(new BufferGeometry(), this.materials.cut);
    this.cut.renderOrder = 2;
    this.hit = new Mesh(new BufferGeometry(), this.materials.interference);
    this.hit.renderOrder = 1;
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
    this.cut.geometry.dispose();
    this.cut.geometry = cutGeometry(k, v.exaggeration) ?? new BufferGeometry();
    this.hit.geometry.dispose();
    const hitGeom = interferenceGeometry(study, k);
    this.hit.geometry = hitGeom ?? new BufferGeometry();

    const size = v.customer ? LABEL_CUSTOMER_MM : LABEL_MM;
    const L = this.labels;
    for (const l of Object.values(L)) l.heightMm = size;
    const state = fitState(k, result);
    const Rf = flangeRadiusMm(study.kits[snap.kitIndex], k, study.case.studHoleDiameterMm);
    const c = governingClearanceMm(k);
    L.skirt.set(`skirt ${diameterLabel(k.skirt.diameterMm, v.units)} · ${c < 0 ? "interference" : "clearance"} ${signedLengthLabel(c, v.units)}`, STATE_3D[state]);
    L.skirt.sprite.position.set(...toWorld(-Rf, Rf * 0.6, -k.skirt.gasketMm - FLANGE_DRAWN_MM - size * 1.2));
    L.skirt.resize();
    L.cut.sprite.visible = k.cut !== null;
    if (k.cut) {
      L.cut.set(`cut ${diameterLabel(k.cut.diameterMm, v.units)} × ${lengthLabel(k.cut.depthMm, v.units)} deep`, "#0f5e5c");
      L.cut.sprite.center.set(1, 0.5);
      L.cut.sprite.position.set(...toWorld(k.cut.diameterMm / 2 + 4, -k.cut.diameterMm * 0.45, k.cut.depthMm + size));
      L.cut.resize();
    }
    const w = k.thinnestWall;
    L.wall.sprite.visible = this.wallLine.visible = w !== null && k.cut !== null;
    if (w && k.cut) {
      const color = w.ok ? "#2b2f33" : STATE_3D.interfere;
      L.wall.set(`thinnest wall ${lengthLabel(w.minWallMm, v.units)} · ${w.label}`, color);
      L.wall.sprite.position.set(...toWorld(w.atMm[0], w.atMm[1], -size * 0.9));
      L.wall.resize();
      const a = this.wallLine.geometry.getAttribute("position") as Float32BufferAttribute;
      a.setXYZ(0, ...toWorld(w.cutPointMm[0], w.cutPointMm[1], -0.4));
      a.setXYZ(1, ...toWorld(w.atMm[0], w.atMm[1], -0.4));
      a.needsUpdate = true;
      this.wallLine.geometry.computeBoundingSphere();
      this.materials.wall.color.set(color);
    }
    const worst = k.interference.vsCut ?? (k.cut ? null : k.interference.vsMouth);
    L.hit.sprite.visible = hitGeom !== null;
    if (hitGeom) {
      const at = worst?.atMm ?? [k.skirt.diameterMm / 2, 0];
      L.hit.set(worst ? `interference ${lengthLabel(worst.deepestMm, v.units)} deep` : "skirt bottoms on the step", STATE_3D.interfere);
      L.hit.sprite.position.set(...toWorld(at[0] + 3, at[1], Math.min(k.skirt.protrusionMm, study.case.mouth.depthMm) * 0.6));
      L.hit.resize();
    }
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
  }
}
