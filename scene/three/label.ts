import { SCENE } from "@/model/palette";
import { Vector3, type Camera } from "three";

// Text labels of the 3D view, written as HTML over the canvas rather than drawn into WebGL textures: a
// step writes a string and a CSS transform, and the browser lays out and paints the text with the page's
// own font. Each label is pinned to a point of the scene and sized as if it stood there, so it shrinks
// and grows with the view like a board beside the part; it is never hidden behind the solids. The layer
// is decoration (the view box is a labelled image and the results give every figure in words).

/** The label's box at scale 1, px: its text size, height, side padding, frame and corner radius. */
const FONT_PX = 44;
export const LABEL_BOX_PX = FONT_PX + 24;
const BOX_PX = LABEL_BOX_PX;
const PAD_PX = 14;
const FRAME_PX = 3;
const RADIUS_PX = 10;
/** The ground's opacity under the text. */
const GROUND_ALPHA = 0.92;

/** Where a label goes on screen: its anchor in CSS px from the view's top left and the scale of its box. */
export interface ScreenPlacement {
  readonly x: number;
  readonly y: number;
  readonly scale: number;
  /** False when the anchor is behind the camera. */
  readonly inFront: boolean;
}

const scratch = new Vector3();

/** The least gap, CSS px, between a label and the edge of the view. */
const EDGE_PX = 4;

/** A label's box on screen: its top left corner in CSS px from the view's top left and the scale of its box. */
export interface ShownBox {
  readonly left: number;
  readonly top: number;
  readonly scale: number;
}

/**
 * The box of a label `widthPx` wide at scale 1 (and BOX_PX high), set beside its anchor on the side `align`
 * names and kept inside a view of `width` × `height` CSS px: it slides along the view's edge rather than
 * being cut off, and shrinks when it is wider (or higher) than the view itself. A small part seen close up
 * on a phone puts its labels near the edges, where they would otherwise be clipped.
 */
export function boxInView(at: ScreenPlacement, widthPx: number, align: 0 | 1, width: number, height: number): ShownBox {
  const scale = Math.min(at.scale, Math.max(0, width - 2 * EDGE_PX) / widthPx, Math.max(0, height - 2 * EDGE_PX) / BOX_PX);
  const w = widthPx * scale;
  const h = BOX_PX * scale;
  const within = (v: number, lo: number, hi: number) => Math.min(Math.max(v, lo), Math.max(lo, hi));
  return {
    left: within(at.x - align * w, EDGE_PX, width - EDGE_PX - w),
    top: within(at.y - h / 2, EDGE_PX, height - EDGE_PX - h),
    scale,
  };
}

/** A 2D context to measure text with, made on first use. */
let measure: CanvasRenderingContext2D | null = null;
/** The width of a label's box at scale 1 for `text`, px: its text in the label's font and its side padding. */
function boxWidthPx(text: string, family: string): number {
  measure ??= document.createElement("canvas").getContext("2d");
  if (!measure) return text.length * FONT_PX * 0.6 + 2 * PAD_PX;
  measure.font = `600 ${FONT_PX}px ${family}`;
  return Math.ceil(measure.measureText(text).width) + 2 * PAD_PX;
}

/**
 * Projects a scene point into a view of `width` × `height` CSS px and gives the scale at which a box of
 * BOX_PX stands `heightMm` tall there: the size a camera-facing board of that height has in the picture.
 * The camera's world matrix must be current.
 */
export function screenPlacement(at: Vector3, camera: Camera, width: number, height: number, heightMm: number): ScreenPlacement {
  const v = scratch.copy(at).applyMatrix4(camera.matrixWorldInverse);
  const depth = -v.z;
  const p = camera.projectionMatrix.elements;
  // For a perspective camera a length l at depth d spans l · P[5] / d of the normalised height (2 units);
  // an orthographic camera (P[15] = 1) has no depth in it.
  const ortho = p[15] === 1;
  const pxPerMm = ((height / 2) * p[5]) / (ortho ? 1 : Math.max(depth, 1e-6));
  v.applyMatrix4(camera.projectionMatrix);
  return { x: ((v.x + 1) / 2) * width, y: ((1 - v.y) / 2) * height, scale: (heightMm * pxPerMm) / BOX_PX, inFront: ortho || depth > 0 };
}

/** A label whose text, colour, anchor and side can be changed in place; drawn by the layer it is mounted in. */
export class Label {
  readonly element: HTMLDivElement;
  /** The scene point the label is pinned to. */
  readonly anchor = new Vector3();
  /** Which side of the box sits on the anchor: 0 its left edge, 1 its right edge (vertically, its middle). */
  align: 0 | 1 = 0;
  visible = true;
  heightMm = 4;
  private text = "";
  private color = "";
  private written = { transform: "", shown: false };
  /** The box's width at scale 1 for the text `measured`, px (measured again when the text changes). */
  private widthPx = 0;
  private measured = "";
  /** Where it was last put, for the snapshot. */
  private placed: ShownBox | null = null;

  constructor() {
    const el = document.createElement("div");
    const s = el.style;
    s.position = "absolute";
    s.left = "0";
    s.top = "0";
    s.transformOrigin = "0 0";
    s.whiteSpace = "nowrap";
    s.boxSizing = "border-box";
    s.height = `${BOX_PX}px`;
    s.lineHeight = `${BOX_PX - 2 * FRAME_PX}px`;
    s.padding = `0 ${PAD_PX - FRAME_PX}px`;
    s.fontSize = `${FONT_PX}px`;
    s.fontWeight = "600";
    s.borderRadius = `${RADIUS_PX}px`;
    s.borderWidth = `${FRAME_PX}px`;
    s.borderStyle = "solid";
    s.background = groundColour();
    s.visibility = "hidden";
    s.contain = "layout style";
    el.dataset.label = "";
    this.element = el;
  }

  /** Sets the text and colour (written to the page only when they changed). */
  set(text: string, color: string) {
    if (text !== this.text) {
      this.text = text;
      this.element.textContent = text;
    }
    if (color !== this.color) {
      this.color = color;
      this.element.style.color = color;
      this.element.style.borderColor = color;
    }
  }

  /** Puts the label where its anchor is seen; writes the page only when its place or visibility changed. */
  place(camera: Camera, width: number, height: number) {
    const at = screenPlacement(this.anchor, camera, width, height, this.heightMm);
    const shown = this.visible && this.text !== "" && at.inFront;
    if (shown && this.measured !== this.text) {
      this.widthPx = boxWidthPx(this.text, this.family());
      this.measured = this.text;
    }
    const box = shown ? boxInView(at, this.widthPx, this.align, width, height) : null;
    this.placed = box;
    if (box) {
      // Round to a tenth of a pixel, so a frame that leaves the label where it was writes nothing.
      const t = `translate(${box.left.toFixed(1)}px,${box.top.toFixed(1)}px) scale(${box.scale.toFixed(4)})`;
      if (t !== this.written.transform) this.element.style.transform = t;
      this.written.transform = t;
    }
    if (shown !== this.written.shown) this.element.style.visibility = shown ? "visible" : "hidden";
    this.written.shown = shown;
  }

  /** Draws the label as it is shown into a 2D context of the view at `dpr` device px per CSS px (for a snapshot of the view). */
  drawInto(ctx: CanvasRenderingContext2D, dpr: number) {
    const box = this.placed;
    if (!box) return;
    ctx.save();
    ctx.font = `600 ${FONT_PX}px ${this.family()}`;
    const w = this.widthPx;
    const k = box.scale * dpr;
    ctx.setTransform(k, 0, 0, k, box.left * dpr, box.top * dpr);
    ctx.beginPath();
    ctx.roundRect(FRAME_PX / 2, FRAME_PX / 2, w - FRAME_PX, BOX_PX - FRAME_PX, RADIUS_PX);
    ctx.globalAlpha = GROUND_ALPHA;
    ctx.fillStyle = SCENE.labelGround;
    ctx.fill();
    ctx.globalAlpha = 1;
    ctx.lineWidth = FRAME_PX;
    ctx.strokeStyle = this.color;
    ctx.stroke();
    ctx.fillStyle = this.color;
    ctx.textBaseline = "middle";
    ctx.fillText(this.text, PAD_PX, BOX_PX / 2 + 2);
    ctx.restore();
  }

  /** The label's font family as the page gives it (read once it is on the page). */
  private fontFamily = "";
  private family(): string {
    if (!this.fontFamily && this.element.isConnected) this.fontFamily = getComputedStyle(this.element).fontFamily;
    return this.fontFamily || "ui-sans-serif, sans-serif";
  }

  dispose() {
    this.element.remove();
  }
}

/** The label ground at its opacity, as a CSS colour. */
function groundColour(): string {
  const hex = SCENE.labelGround.replace("#", "");
  const [r, g, b] = [0, 2, 4].map((i) => parseInt(hex.slice(i, i + 2), 16));
  return `rgba(${r}, ${g}, ${b}, ${GROUND_ALPHA})`;
}
