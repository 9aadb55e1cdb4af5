// A plain grey PNG of any size, written by hand for tests that need a real image file of known pixels
// (PNG spec, ISO/IEC 15948: the signature, IHDR, one IDAT of filter-0 rows, IEND; CRC-32 of each chunk).
import { crc32, deflateSync } from "node:zlib";

export function greyPng(width: number, height: number, grey = 0x80): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([len, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 0; // greyscale
  const rows = Buffer.alloc((width + 1) * height, grey);
  for (let y = 0; y < height; y++) rows[y * (width + 1)] = 0; // filter type 0 at the start of each row
  return Buffer.concat([Buffer.from("89504e470d0a1a0a", "hex"), chunk("IHDR", ihdr), chunk("IDAT", deflateSync(rows)), chunk("IEND", Buffer.alloc(0))]);
}
