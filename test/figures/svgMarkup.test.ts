import { describe, expect, it } from 'vitest';
import { escapeXml, num, pathData, text } from '../../src/figures/svgMarkup';
import { textWidth, wrapText } from '../../src/figures/textWidth';

describe('SVG markup helpers', () => {
  it('escapes the five XML special characters (XML 1.0, section 2.4)', () => {
    expect(escapeXml(`a<b>&"c'`)).toBe('a&#60;b&#62;&#38;&#34;c&#39;');
  });

  it('writes coordinates with at most two decimals and never "-0"', () => {
    expect(num(1.23456)).toBe('1.23');
    expect(num(-0.001)).toBe('0');
    expect(num(250)).toBe('250');
  });

  it('breaks a path at non-finite points instead of drawing to NaN', () => {
    expect(pathData([[0, 0], [1, 1], [NaN, NaN], [2, 2], [3, 3]])).toBe('M0,0L1,1M2,2L3,3');
    expect(pathData([[0, 0], [1, 0], [1, 1]], true)).toBe('M0,0L1,0L1,1Z');
  });

  it('turns Unicode superscripts into raised tspans of plain digits, and puts the baseline back', () => {
    const markup = text('m a⁻¹ s', 0, 0, { size: 10 });
    expect(markup).toContain('m a<tspan dy="-3.8" font-size="7.2">-1</tspan><tspan dy="3.8"> s</tspan>');
    // Only Latin-1 characters remain, so the standard PDF fonts can show every one.
    expect(text('2.4 × 10⁻²⁴ Pa⁻³ − 1 °C', 0, 0, { size: 8 })).toMatch(/^[\u0020-\u00ff]*$/);
  });

  it('estimates Helvetica widths from the font metrics (Adobe Helvetica AFM: digits 556/1000 em, space 278; from memory)', () => {
    expect(textWidth('0123456789', 10)).toBeCloseTo(55.6, 6);
    expect(textWidth(' ', 10)).toBeCloseTo(2.78, 6);
  });

  it('wraps words to a width and keeps no-break spaces together', () => {
    const lines = wrapText('aaaa bbbb cccc dddd', 10, textWidth('aaaa bbbb', 10) + 0.1);
    expect(lines).toEqual(['aaaa bbbb', 'cccc dddd']);
    expect(wrapText('2.4\u00a0×\u00a010', 10, 1)).toEqual(['2.4\u00a0×\u00a010']);
  });
});
