/**
 * An SVG figure as a PNG of a given pixel width, drawn by the browser itself (an <img> of the SVG
 * onto a canvas, white behind), with its resolution stated in the file.
 */
import { withDpi } from './pngResolution';

/** The figure's page size in points, from its viewBox. */
export function svgPageSize(svg: string): { width: number; height: number } {
  const match = /viewBox="0 0 ([\d.]+) ([\d.]+)"/.exec(svg);
  if (!match) throw new Error('the figure has no viewBox');
  return { width: Number(match[1]), height: Number(match[2]) };
}

/** Pixel size of a PNG of the figure printed `widthMm` wide at `dpi`. */
export function pngPixelSize(svg: string, widthMm: number, dpi: number): { width: number; height: number } {
  const page = svgPageSize(svg);
  const width = Math.round((widthMm / 25.4) * dpi);
  return { width, height: Math.round((width * page.height) / page.width) };
}

export async function svgToPng(svg: string, widthMm: number, dpi: number): Promise<Blob> {
  const { width, height } = pngPixelSize(svg, widthMm, dpi);
  const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
  try {
    const image = new Image(width, height);
    image.src = url;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = width;
    canvas.height = height;
    const context = canvas.getContext('2d');
    if (!context) throw new Error('this browser gave no 2-D canvas to draw the PNG on');
    context.fillStyle = '#ffffff';
    context.fillRect(0, 0, width, height);
    context.drawImage(image, 0, 0, width, height);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
    if (!blob) throw new Error(`the browser could not make a PNG of ${width} × ${height} pixels; try a smaller size`);
    const bytes = withDpi(new Uint8Array(await blob.arrayBuffer()), dpi);
    return new Blob([bytes as BlobPart], { type: 'image/png' });
  } finally {
    URL.revokeObjectURL(url);
  }
}
