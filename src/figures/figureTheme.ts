/**
 * Colours, type sizes and page units of the exported figures. The colours are those of the
 * workbench (Okabe & Ito 2008 colour-blind-safe set for data; neutral greys for bed and frame).
 * Type is Helvetica (Arial/Liberation Sans where Helvetica is missing): the PDF conversion maps it
 * to the standard PDF Helvetica, which every reader has, so no font needs embedding.
 */
export const FONT_FAMILY = 'Helvetica, Arial, Liberation Sans, sans-serif';

export const COLOURS = {
  text: '#1a1a1a',
  muted: '#4d4d4d',
  frame: '#1a1a1a',
  grid: '#e3e3e3',
  bedFill: '#ddd6c8',
  bedLine: '#000000',
  iceFill: '#56b4e9',
  iceLine: '#0072b2',
  ela: '#d55e00',
  /** ELA text: a darker vermillion, 5.2:1 on white (the line colour gives 3.9:1, under WCAG's 4.5:1). */
  elaText: '#b34f00',
  speed: '#0072b2',
  sliding: '#009e73',
  stress: '#cc79a7',
  length: '#0072b2',
  volume: '#0072b2',
  warming: '#e69f00',
  water: '#1f5f99',
  /** Debris cover along the ice surface. */
  debris: '#7a4e1d',
  caution: '#a63a00',
} as const;

/** Type sizes [pt]: readable when the figure is printed at its stated width. */
export const TYPE = { title: 10, axisTitle: 8.5, tick: 7.5, legend: 7.5, caption: 7, note: 7.5 } as const;

export const POINTS_PER_MM = 72 / 25.4;

/** Default printed sizes [mm]: about a full text width of an A4 report. */
export const DEFAULT_WIDTH_MM = 170;

/** Observations (measured points, observed terminus): the workbench's darker reddish purple. */
export const COLOURS_OBSERVATION = '#8f2d6f';
