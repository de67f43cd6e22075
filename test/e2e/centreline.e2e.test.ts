/**
 * The GeoJSON centreline import in headless Chromium: a line drawn in a GIS (invented, in an
 * imaginary valley) with elevations becomes the initial surface as one undoable edit; a line with
 * a position lacking its elevation is listed by index and not imported.
 */
import { describe, expect, inject, it } from 'vitest';
import { saveElementScreenshot, saveScreenshot, sharedBrowser } from './browser';

const baseUrl = inject('baseUrl');

// Invented centreline, head first: about 9.6 km down an imaginary valley, 3,350 m to 2,250 m.
const CENTRELINE = {
  type: 'FeatureCollection',
  features: [
    {
      type: 'Feature',
      properties: { name: 'invented centreline' },
      geometry: {
        type: 'LineString',
        coordinates: [
          [7.1, 61.5, 3350],
          [7.115, 61.494, 3230],
          [7.132, 61.487, 3090],
          [7.15, 61.481, 2960],
          [7.168, 61.474, 2820],
          [7.186, 61.468, 2690],
          [7.204, 61.461, 2560],
          [7.222, 61.455, 2440],
          [7.24, 61.448, 2330],
          [7.258, 61.442, 2250],
        ],
      },
    },
  ],
};

describe('GeoJSON centreline import in headless Chromium', () => {
  const session = sharedBrowser();

  it('lists a position without elevation by its index and imports nothing', async () => {
    const { page, errors } = session();
    await page.goto(baseUrl, { waitUntil: 'networkidle' });
    await page.getByRole('tab', { name: 'Geometry' }).click();
    await page.getByRole('button', { name: 'Import centreline from GeoJSON…' }).click();
    const broken = structuredClone(CENTRELINE);
    broken.features[0].geometry.coordinates[4] = [7.168, 61.474] as unknown as number[];
    await page.getByLabel('GeoJSON file').setInputFiles({ name: 'broken.geojson', mimeType: 'application/geo+json', buffer: Buffer.from(JSON.stringify(broken)) });
    const problems = page.getByRole('list', { name: 'Positions that could not be read' });
    await problems.waitFor({ state: 'visible' });
    expect(await problems.getByRole('listitem').allTextContents()).toEqual([
      'Position 4: has no elevation; each position must be [longitude, latitude, elevation in m] — export the line with its Z values (e.g. draped on a DEM)',
    ]);
    expect(await page.getByRole('button', { name: 'Import', exact: true }).isDisabled()).toBe(true);
    await saveElementScreenshot(page.getByRole('dialog', { name: 'Import a centreline (GeoJSON)' }), 'centreline-bad-position');
    expect(errors).toEqual([]);
  });

  it('imports a clean centreline as the surface, as one undoable edit', async () => {
    const { page, errors } = session();
    await page.getByLabel('GeoJSON file').setInputFiles({
      name: 'centreline.geojson',
      mimeType: 'application/geo+json',
      buffer: Buffer.from(JSON.stringify(CENTRELINE)),
    });
    const dialog = page.getByRole('dialog', { name: 'Import a centreline (GeoJSON)' });
    await dialog.getByText(/LineString at features\[0\]\.geometry \("invented centreline"\): 10 positions read; [\d.]+ km long\./).waitFor();
    await dialog.getByRole('img', { name: 'Preview of the imported profile' }).waitFor();
    await saveElementScreenshot(dialog, 'centreline-dialog');
    await page.getByRole('button', { name: 'Import', exact: true }).click();
    await expect
      .poll(() => page.getByRole('button', { name: /^Undo/ }).textContent())
      .toBe('Undo: Import centreline centreline.geojson');
    await saveElementScreenshot(page.locator('svg.long-profile'), 'centreline-imported-profile');
    await saveScreenshot(page, 'centreline-imported');
    expect(errors).toEqual([]);
  });
});
