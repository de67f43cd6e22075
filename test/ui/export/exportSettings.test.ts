import { describe, expect, it } from 'vitest';
import { checkExportSettings } from '../../../src/ui/export/exportSettings';

describe('export settings', () => {
  it('takes sensible values, with a decimal comma too', () => {
    expect(checkExportSettings({ widthMm: '170', dpi: '300', every: '50' }, 300)).toEqual({ ok: true, settings: { widthMm: 170, dpi: 300, every: 50 } });
    expect(checkExportSettings({ widthMm: '84,5', dpi: '600', every: '30' }, 300)).toEqual({ ok: true, settings: { widthMm: 84.5, dpi: 600, every: 30 } });
  });

  it('names each field that is wrong and what is allowed', () => {
    const result = checkExportSettings({ widthMm: 'wide', dpi: '10', every: '0' }, 300);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.messages).toEqual([
      'Figure width: "wide" is not allowed; give a width from 40 to 500 mm.',
      'PNG resolution: "10" is not allowed; give 72 to 1200 dots per inch.',
      'Years between snapshots: "0" is not allowed; give a number of years above 0 and at most the run length (300 a).',
    ]);
  });

  it('refuses a PNG too large for a browser canvas, with its pixel width', () => {
    const result = checkExportSettings({ widthMm: '500', dpi: '1200', every: '50' }, 300);
    expect(result).toEqual({
      ok: false,
      messages: ['PNG size: 500 mm at 1200 dpi is 23622 pixels wide; at most 12000 are allowed. Lower the width or the resolution.'],
    });
  });

  it('refuses intervals that would give more than twelve snapshots', () => {
    const result = checkExportSettings({ widthMm: '170', dpi: '300', every: '5' }, 300);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.messages[0]).toBe('Years between snapshots: 5 a would give more than 12 snapshots; give at least 28 a.');
  });
});
