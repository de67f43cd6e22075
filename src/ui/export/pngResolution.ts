/**
 * PNG bytes: the image size from the IHDR chunk, and a pHYs chunk stating the resolution, so that
 * a 300 dpi export is placed at its intended printed size by word processors and layout programs.
 * Chunk layout and CRC-32 as in the PNG specification (ISO/IEC 15948:2004, sections 5.3, 11.2.2,
 * 11.3.5.3 and annex D).
 */
const SIGNATURE = [137, 80, 78, 71, 13, 10, 26, 10];

let crcTable: Uint32Array | undefined;

/** CRC-32 (polynomial 0xEDB88320, reflected), as PNG chunks carry it. */
export function crc32(bytes: Uint8Array): number {
  if (!crcTable) {
    crcTable = new Uint32Array(256);
    for (let n = 0; n < 256; n++) {
      let c = n;
      for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
      crcTable[n] = c >>> 0;
    }
  }
  let c = 0xffffffff;
  for (const b of bytes) c = crcTable[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

export function isPng(bytes: Uint8Array): boolean {
  return bytes.length >= 33 && SIGNATURE.every((b, i) => bytes[i] === b);
}

/** Width and height in pixels from the IHDR chunk (always first, at byte 8). */
export function pngSize(bytes: Uint8Array): { width: number; height: number } {
  if (!isPng(bytes)) throw new Error('not a PNG file');
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  return { width: view.getUint32(16), height: view.getUint32(20) };
}

/** Dots per inch from a pHYs chunk in metres, or null when there is none. */
export function pngDpi(bytes: Uint8Array): number | null {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  let at = 8;
  while (at + 8 <= bytes.length) {
    const length = view.getUint32(at);
    const type = String.fromCharCode(...bytes.subarray(at + 4, at + 8));
    if (type === 'pHYs' && bytes[at + 16] === 1) return Math.round(view.getUint32(at + 8) * 0.0254);
    if (type === 'IDAT' || type === 'IEND') return null;
    at += 12 + length;
  }
  return null;
}

/** The PNG with a pHYs chunk for `dpi` inserted right after IHDR (before any image data). */
export function withDpi(bytes: Uint8Array, dpi: number): Uint8Array {
  const ihdrEnd = 8 + 12 + 13;
  const perMetre = Math.round(dpi / 0.0254);
  const chunk = new Uint8Array(21);
  const view = new DataView(chunk.buffer);
  view.setUint32(0, 9);
  chunk.set([0x70, 0x48, 0x59, 0x73], 4); // "pHYs"
  view.setUint32(8, perMetre);
  view.setUint32(12, perMetre);
  chunk[16] = 1; // unit: metre
  view.setUint32(17, crc32(chunk.subarray(4, 17)));
  const out = new Uint8Array(bytes.length + chunk.length);
  out.set(bytes.subarray(0, ihdrEnd), 0);
  out.set(chunk, ihdrEnd);
  out.set(bytes.subarray(ihdrEnd), ihdrEnd + chunk.length);
  return out;
}
