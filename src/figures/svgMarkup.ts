/**
 * Plain-string SVG writing for the exported figures: no DOM, so the browser and the command line
 * produce byte-identical files from the same data. Coordinates are in points (1/72 in) and are
 * written with at most two decimals, which is finer than any printer and keeps files small.
 */

export type Attributes = Record<string, string | number | undefined>;

/** Escapes the five XML special characters. */
export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** A coordinate or length as written into the file: two decimals at most, no "-0". */
export function num(value: number): string {
  const rounded = Math.round(value * 100) / 100;
  return String(rounded === 0 ? 0 : rounded);
}

function attributeText(attributes: Attributes): string {
  let text = '';
  for (const [name, value] of Object.entries(attributes)) {
    if (value === undefined) continue;
    text += ` ${name}="${typeof value === 'number' ? num(value) : escapeXml(value)}"`;
  }
  return text;
}

/** One element; children are already-written markup. */
export function element(name: string, attributes: Attributes, children?: string | readonly string[]): string {
  const inner = children === undefined ? '' : typeof children === 'string' ? children : children.join('');
  return inner === '' ? `<${name}${attributeText(attributes)}/>` : `<${name}${attributeText(attributes)}>${inner}</${name}>`;
}

/** A polyline as path data ("M x,y L x,y ..."); non-finite points break the line. */
export function pathData(points: readonly (readonly [number, number])[], close = false): string {
  let d = '';
  let pen = false;
  for (const [x, y] of points) {
    if (!Number.isFinite(x) || !Number.isFinite(y)) {
      pen = false;
      continue;
    }
    d += `${pen ? 'L' : 'M'}${num(x)},${num(y)}`;
    pen = true;
  }
  return close && d !== '' ? d + 'Z' : d;
}

/** Unicode superscript digits and minus, and the plain characters they stand for. */
export const SUPERSCRIPT_DIGITS: Record<string, string> = {
  '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁻': '-',
};

export interface TextOptions {
  size: number;
  anchor?: 'start' | 'middle' | 'end';
  weight?: 'normal' | 'bold';
  fill?: string;
  /** Degrees, about (x, y). */
  rotate?: number;
  italic?: boolean;
}

/**
 * A text element. Unicode superscripts ("a⁻¹", "10⁻²⁴") become raised tspans of ordinary digits and
 * the true minus sign a hyphen, so that PDF conversion with the standard PDF fonts (which hold only
 * the Latin-1 range) shows every character, and the SVG text stays real, editable text.
 */
export function text(content: string, x: number, y: number, options: TextOptions): string {
  const rise = options.size * 0.38;
  const pieces: string[] = [];
  let run = '';
  let raised = false;
  let afterRaised = false;
  const flush = () => {
    if (run === '') return;
    if (raised) pieces.push(element('tspan', { dy: -rise, 'font-size': options.size * 0.72 }, escapeXml(run)));
    // A raised run moves the baseline up for what follows; the next plain run moves it back.
    else if (afterRaised) pieces.push(element('tspan', { dy: rise }, escapeXml(run)));
    else pieces.push(escapeXml(run));
    afterRaised = raised;
    run = '';
  };
  for (const ch of content.replace(/\u2212/g, '-')) {
    const digit = SUPERSCRIPT_DIGITS[ch];
    if ((digit !== undefined) !== raised) {
      flush();
      raised = digit !== undefined;
    }
    run += digit ?? ch;
  }
  flush();
  return element(
    'text',
    {
      x,
      y,
      'font-size': options.size,
      'text-anchor': options.anchor ?? 'start',
      'font-weight': options.weight === 'bold' ? 'bold' : undefined,
      'font-style': options.italic ? 'italic' : undefined,
      fill: options.fill,
      transform: options.rotate ? `rotate(${num(options.rotate)} ${num(x)} ${num(y)})` : undefined,
    },
    pieces.join(''),
  );
}
