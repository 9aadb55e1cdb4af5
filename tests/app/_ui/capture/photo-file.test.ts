import { describe, expect, it } from "vitest";
import { circleThrough, photoProblem, sniffPhotoType } from "@/app/_ui/capture/photo-file";

describe("deck photo checks in the browser", () => {
  it("tells the image type by the first bytes", () => {
    // Signatures: JPEG SOI FF D8 FF (ITU-T T.81 annex B), PNG 89 50 4E 47 0D 0A 1A 0A (ISO/IEC 15948 §5.2), WebP "RIFF"…"WEBP" (RFC 9649 §2).
    expect(sniffPhotoType(Uint8Array.from([0xff, 0xd8, 0xff, 0xe0]))).toBe("image/jpeg");
    expect(sniffPhotoType(Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))).toBe("image/png");
    expect(sniffPhotoType(new TextEncoder().encode("RIFF\0\0\0\0WEBPVP8 "))).toBe("image/webp");
    expect(sniffPhotoType(new TextEncoder().encode("GIF89a......"))).toBeNull();
    expect(sniffPhotoType(new Uint8Array())).toBeNull();
  });

  it("refuses an empty file, one above the limit and one that is not an image, in words", () => {
    expect(photoProblem(0, "image/png")).toBe("The file is empty.");
    expect(photoProblem(9 * 1024 * 1024, "image/jpeg")).toBe("The file is 9.0 MB; photos are limited to 8 MB.");
    expect(photoProblem(1000, null)).toMatch(/not a JPEG, PNG or WebP image/);
    expect(photoProblem(8 * 1024 * 1024, "image/jpeg")).toBeNull();
  });

  it("finds the circle through three points of a mouth's edge", () => {
    // Points of the circle of radius 31 about (2, −1), at 10°, 130° and 250°: by construction.
    const on = (deg: number): [number, number] => [2 + 31 * Math.cos((deg * Math.PI) / 180), -1 + 31 * Math.sin((deg * Math.PI) / 180)];
    const c = circleThrough(on(10), on(130), on(250));
    expect(c?.diameterMm).toBeCloseTo(62, 9);
    expect(c?.centerMm[0]).toBeCloseTo(2, 9);
    expect(c?.centerMm[1]).toBeCloseTo(-1, 9);
    expect(circleThrough([0, 0], [1, 1], [2, 2])).toBeNull();
  });
});
