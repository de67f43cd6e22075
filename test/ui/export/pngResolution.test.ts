import { describe, expect, it } from 'vitest';
import { crc32, isPng, pngDpi, pngSize, withDpi } from '../../../src/ui/export/pngResolution';

/** A 1 x 1 white PNG (signature, IHDR, IDAT, IEND), as written by common encoders. */
const ONE_PIXEL = Uint8Array.from(
  atob('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAIAAACQd1PeAAAADElEQVR4nGP4//8/AAX+Av4N70a4AAAAAElFTkSuQmCC'),
  (c) => c.charCodeAt(0),
);

describe('PNG size and resolution', () => {
  it('computes CRC-32 as PNG does (check value of "123456789" is CBF43926, ISO/IEC 15948 annex D / ISO 3309)', () => {
    expect(crc32(new TextEncoder().encode('123456789'))).toBe(0xcbf43926);
  });

  it('reads the size from IHDR and finds no resolution in a plain file', () => {
    expect(isPng(ONE_PIXEL)).toBe(true);
    expect(pngSize(ONE_PIXEL)).toEqual({ width: 1, height: 1 });
    expect(pngDpi(ONE_PIXEL)).toBeNull();
  });

  it('adds a pHYs chunk with a valid CRC that states the resolution (300 dpi = 11811 px per metre)', () => {
    const out = withDpi(ONE_PIXEL, 300);
    expect(out.length).toBe(ONE_PIXEL.length + 21);
    expect(pngSize(out)).toEqual({ width: 1, height: 1 });
    expect(pngDpi(out)).toBe(300);
    const view = new DataView(out.buffer);
    expect(view.getUint32(33 + 8)).toBe(11811);
    const stored = view.getUint32(33 + 17);
    expect(stored).toBe(crc32(out.subarray(33 + 4, 33 + 17)));
    // Everything after the new chunk is the original file, unchanged.
    expect(Array.from(out.subarray(54))).toEqual(Array.from(ONE_PIXEL.subarray(33)));
  });

  it('refuses bytes that are not a PNG', () => {
    expect(() => pngSize(new Uint8Array(40))).toThrow('not a PNG file');
  });
});
