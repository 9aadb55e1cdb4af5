import { PerspectiveCamera, Vector3 } from "three";
import { describe, expect, it } from "vitest";
import { boxInView, LABEL_BOX_PX, screenPlacement } from "@/scene/three/label";

// The 3D view's labels are HTML over the canvas, pinned to a point of the scene and sized as a board of a
// given height standing there. The checks are those of the pinhole camera: the point looked at is seen at
// the centre of the view, and a length l at distance d spans l / (2 d tan(fov / 2)) of the view's height
// (the perspective projection; any text on computer graphics, e.g. the OpenGL projection matrix).

const W = 800, H = 600, FOV = 30;

function camera(at: Vector3, target: Vector3): PerspectiveCamera {
  const c = new PerspectiveCamera(FOV, W / H, 1, 4000);
  c.position.copy(at);
  c.lookAt(target);
  c.updateMatrixWorld();
  return c;
}

describe("where a label of the 3D view is shown", () => {
  const target = new Vector3(0, -9, 0);
  const cam = camera(new Vector3(95, 95.5, 127.3), target);
  const d = cam.position.distanceTo(target);

  it("puts the point looked at in the middle of the view", () => {
    const p = screenPlacement(target, cam, W, H, 4);
    expect(p.x).toBeCloseTo(W / 2, 6);
    expect(p.y).toBeCloseTo(H / 2, 6);
    expect(p.inFront).toBe(true);
  });

  it("sizes the label as a board of its height at its distance from the camera", () => {
    const heightMm = 4.2;
    const p = screenPlacement(target, cam, W, H, heightMm);
    const px = (H * heightMm) / (2 * d * Math.tan(((FOV / 2) * Math.PI) / 180));
    expect(p.scale * LABEL_BOX_PX).toBeCloseTo(px, 6);
    // Twice as far, half as tall.
    const far = camera(target.clone().add(cam.position.clone().sub(target).multiplyScalar(2)), target);
    expect(screenPlacement(target, far, W, H, heightMm).scale).toBeCloseTo(p.scale / 2, 9);
  });

  it("follows the camera: a point up the camera's up axis is seen higher, one to its right further right", () => {
    const up = new Vector3(0, 1, 0).applyQuaternion(cam.quaternion);
    const right = new Vector3(1, 0, 0).applyQuaternion(cam.quaternion);
    const mid = screenPlacement(target, cam, W, H, 4);
    const higher = screenPlacement(target.clone().addScaledVector(up, 10), cam, W, H, 4);
    const righter = screenPlacement(target.clone().addScaledVector(right, 10), cam, W, H, 4);
    expect(higher.y).toBeLessThan(mid.y - 10);
    expect(higher.x).toBeCloseTo(mid.x, 6);
    expect(righter.x).toBeGreaterThan(mid.x + 10);
    expect(righter.y).toBeCloseTo(mid.y, 6);
  });

  it("says when the point is behind the camera", () => {
    const behind = cam.position.clone().add(cam.position.clone().sub(target));
    expect(screenPlacement(behind, cam, W, H, 4).inFront).toBe(false);
  });
});

// A label near the edge of a small view (a small part seen close up on a phone) is kept inside the view: it
// slides along the edge, and shrinks only when it is wider than the view. Our own layout rule; the figures
// follow from the box's corners.
describe("a label kept inside the view", () => {
  const VW = 340, VH = 255, WIDE = 600, EDGE = 4;
  const at = (x: number, y: number, scale: number) => ({ x, y, scale, inFront: true });

  it("stands beside its anchor when it fits", () => {
    const box = boxInView(at(100, 120, 0.25), WIDE, 0, VW, VH);
    expect(box).toEqual({ left: 100, top: 120 - (LABEL_BOX_PX * 0.25) / 2, scale: 0.25 });
    const leftOf = boxInView(at(300, 120, 0.25), WIDE, 1, VW, VH);
    expect(leftOf.left).toBeCloseTo(300 - WIDE * 0.25, 9);
  });

  it("slides back inside across the right edge, the left edge and the bottom", () => {
    const right = boxInView(at(250, 120, 0.25), WIDE, 0, VW, VH);
    expect(right.left + WIDE * right.scale).toBeCloseTo(VW - EDGE, 9);
    expect(right.scale).toBe(0.25);
    const left = boxInView(at(60, 120, 0.25), WIDE, 1, VW, VH);
    expect(left.left).toBe(EDGE);
    const low = boxInView(at(100, VH + 30, 0.25), WIDE, 0, VW, VH);
    expect(low.top + LABEL_BOX_PX * low.scale).toBeCloseTo(VH - EDGE, 9);
  });

  it("shrinks to the view's width when it is wider than the view", () => {
    const box = boxInView(at(170, 120, 1), WIDE, 0, VW, VH);
    expect(WIDE * box.scale).toBeCloseTo(VW - 2 * EDGE, 9);
    expect(box.left).toBe(EDGE);
  });
});
