// The reference points a deck photo is scaled or squared up by, as the API and the form check them.
import { describe, expect, it } from "vitest";
import { CasePhotoRequestSchema, PhotoReferenceSchema, pointsOutsidePhoto } from "@/model/schemas/case-photos";

const issues = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  r.success ? [] : (r.error?.issues ?? []).map((i) => `${i.path.join(".")}: ${i.message}`);

describe("photo reference points", () => {
  it("take two distinct points and a positive distance, or four corners of a four-sided figure", () => {
    expect(PhotoReferenceSchema.safeParse({ kind: "scale", points: [[10, 10], [200, 10]], distanceMm: 56 }).success).toBe(true);
    expect(PhotoReferenceSchema.safeParse({ kind: "rectangle", points: [[0, 0], [100, 0], [100, 80], [0, 80]], widthMm: 56, heightMm: 45 }).success).toBe(true);
  });

  it("refuse points on one spot, three on one line, and four clicked out of turn into a bow tie", () => {
    expect(issues(PhotoReferenceSchema.safeParse({ kind: "scale", points: [[10, 10], [10, 10]], distanceMm: 56 }))).toEqual([expect.stringMatching(/^points: .*same spot/)]);
    expect(issues(PhotoReferenceSchema.safeParse({ kind: "rectangle", points: [[0, 0], [50, 0], [100, 0], [50, 80]], widthMm: 56, heightMm: 45 }))).toEqual([expect.stringMatching(/^points: .*one line/)]);
    // Ordered around their centre the four are a square again: a click order is not a shape.
    expect(PhotoReferenceSchema.safeParse({ kind: "rectangle", points: [[0, 0], [100, 80], [100, 0], [0, 80]], widthMm: 56, heightMm: 45 }).success).toBe(true);
  });

  it("refuse lengths that are not above zero and points that are not finite numbers", () => {
    expect(issues(PhotoReferenceSchema.safeParse({ kind: "scale", points: [[10, 10], [200, 10]], distanceMm: 0 }))).toEqual([expect.stringMatching(/^distanceMm: .*above zero/)]);
    expect(issues(PhotoReferenceSchema.safeParse({ kind: "scale", points: [[Number.NaN, 10], [200, 10]], distanceMm: 5 }))[0]).toMatch(/^points\.0\.0: /);
    expect(issues(PhotoReferenceSchema.safeParse({ kind: "scale", points: [[-1, 10], [200, 10]], distanceMm: 5 }))[0]).toMatch(/^points\.0\.0: .*not negative/);
  });

  it("name each point that lies outside the photo, by its index", () => {
    const ref = { kind: "rectangle" as const, points: [[0, 0], [640, 0], [641, 480], [0, 481]] as [[number, number], [number, number], [number, number], [number, number]], widthMm: 56, heightMm: 45 };
    expect(Object.keys(pointsOutsidePhoto(ref, 640, 480) ?? {})).toEqual(["points.2", "points.3"]);
    expect(pointsOutsidePhoto(ref, 641, 481)).toBeNull();
  });

  it("with a new upload must lie on the photo of the declared size", () => {
    const body = { contentType: "image/png", sizeBytes: 100, widthPx: 100, heightPx: 100, reference: { kind: "scale", points: [[10, 10], [150, 10]], distanceMm: 56 } };
    expect(issues(CasePhotoRequestSchema.safeParse(body))).toEqual([expect.stringMatching(/^reference\.points\.1: Point 2 .*outside the 100 × 100 pixel photo/)]);
    expect(CasePhotoRequestSchema.safeParse({ ...body, widthPx: 200 }).success).toBe(true);
  });
});
