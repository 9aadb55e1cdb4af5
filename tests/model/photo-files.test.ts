import { describe, expect, it } from "vitest";
import { photoExtension, photoProblem, photoSizeProblem, sniffPhotoType, uploadedPhotoProblem } from "@/model/photo-files";

// File signatures: JPEG FF D8 FF (ISO/IEC 10918-1 SOI marker), PNG 89 50 4E 47 0D 0A 1A 0A (ISO/IEC 15948 /
// W3C PNG specification, section 5.2), WebP "RIFF" size "WEBP" (RFC 9649, section 2).
const JPEG = Uint8Array.from([0xff, 0xd8, 0xff, 0xe0]);
const PNG = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
const MB = 1024 * 1024;

describe("photo files", () => {
  it("tell the type by the first bytes, whatever the name says", () => {
    expect(sniffPhotoType(JPEG)).toBe("image/jpeg");
    expect(sniffPhotoType(PNG)).toBe("image/png");
    expect(sniffPhotoType(new TextEncoder().encode("RIFF\0\0\0\0WEBPVP8 "))).toBe("image/webp");
    expect(sniffPhotoType(new TextEncoder().encode("GIF89a......"))).toBeNull();
    expect([photoExtension("image/jpeg"), photoExtension("image/png"), photoExtension("image/webp")]).toEqual(["jpg", "png", "webp"]);
  });

  it("refuse a file over 8 MB with its size, and keep one of exactly 8 MB", () => {
    expect(photoSizeProblem(9 * MB)).toBe("The file is 9.0 MB; photos are limited to 8 MB.");
    expect(photoSizeProblem(8 * MB)).toBeNull();
    expect(photoProblem(0, "image/png")).toBe("The file is empty.");
    expect(photoProblem(1000, null)).toMatch(/not a JPEG, PNG or WebP image/);
  });

  it("refuse an upload whose bytes are not the type it was declared as, and say both", () => {
    expect(uploadedPhotoProblem(1000, PNG, "image/jpeg")).toBe("The file is a PNG image but was declared as JPEG; choose the file again.");
    expect(uploadedPhotoProblem(1000, JPEG, "image/jpeg")).toBeNull();
    expect(uploadedPhotoProblem(9 * MB, JPEG, "image/jpeg")).toMatch(/^The file is 9\.0 MB/);
    expect(uploadedPhotoProblem(1000, new Uint8Array(), "image/jpeg")).toMatch(/not a JPEG, PNG or WebP image/);
  });
});
