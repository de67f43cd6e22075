/**
 * An SVG figure as a one-page PDF of the figure's own size, with real (searchable) text in the
 * standard PDF Helvetica. jsPDF and svg2pdf.js are loaded only when a PDF is asked for, so they
 * cost nothing at start-up; the service worker caches them for offline use like the rest.
 */
import { svgPageSize } from './rasterise';

export async function loadPdfLibraries() {
  const [{ jsPDF }] = await Promise.all([import('jspdf'), import('svg2pdf.js')]);
  return { jsPDF };
}

export function parseSvgElement(svg: string): Element {
  const doc = new DOMParser().parseFromString(svg, 'image/svg+xml');
  const error = doc.querySelector('parsererror');
  if (error) throw new Error(`the figure is not well-formed SVG: ${error.textContent ?? ''}`);
  return doc.documentElement;
}

export async function svgToPdf(svg: string, title: string): Promise<Blob> {
  const { jsPDF } = await loadPdfLibraries();
  const page = svgPageSize(svg);
  const pdf = new jsPDF({ unit: 'pt', format: [page.width, page.height], orientation: page.width >= page.height ? 'landscape' : 'portrait', compress: true });
  pdf.setProperties({ title, creator: 'Firnline' });
  await pdf.svg(parseSvgElement(svg), { x: 0, y: 0, width: page.width, height: page.height });
  return pdf.output('blob');
}
