// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { GeojsonImportDialog } from '../../../src/ui/edit/GeojsonImportDialog';
import { EditorPanels } from '../../../src/ui/edit/EditorPanels';
import { useScenarioStore, demoScenario } from '../../../src/state/scenarioStore';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

function choose(name: string, value: unknown) {
  const input = screen.getByLabelText('GeoJSON file') as HTMLInputElement;
  const text = typeof value === 'string' ? value : JSON.stringify(value);
  fireEvent.change(input, { target: { files: [new File([text], name, { type: 'application/geo+json' })] } });
}

// Invented centrelines in an imaginary valley, drawn down-valley.
const SHORT = {
  type: 'Feature',
  properties: { name: 'invented' },
  geometry: { type: 'LineString', coordinates: [[7.1, 61.5, 3300], [7.11, 61.495, 3100], [7.125, 61.49, 2900], [7.14, 61.486, 2700]] },
};
const LONG = { type: 'LineString', coordinates: [[7.0, 61.5, 3400], [7.1, 61.5, 3000], [7.2, 61.5, 2600], [7.3, 61.5, 2200]] };

describe('GeojsonImportDialog', () => {
  it('lists the positions that cannot be read, by index, and imports nothing', async () => {
    render(<GeojsonImportDialog onClose={() => {}} />);
    choose('line.geojson', { type: 'LineString', coordinates: [[7.1, 61.5, 3300], [7.11, 61.495], [7.12, 95, 3000]] });
    const list = await screen.findByRole('list', { name: 'Positions that could not be read' });
    expect(within(list).getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      'Position 1: has no elevation; each position must be [longitude, latitude, elevation in m] — export the line with its Z values (e.g. draped on a DEM)',
      'Position 2: latitude 95 is outside -90 to 90 degrees',
    ]);
    const importButton = screen.getByRole('button', { name: 'Import' }) as HTMLButtonElement;
    expect(importButton.disabled).toBe(true);
    fireEvent.click(importButton);
    expect(useScenarioStore.getState().scenario).toBe(demoScenario);
  });

  it('says why a file is refused as a whole', async () => {
    render(<GeojsonImportDialog onClose={() => {}} />);
    choose('points.geojson', { type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: { type: 'Point', coordinates: [7, 61, 1] } }] });
    expect((await screen.findByRole('alert')).textContent).toBe(
      'Cannot import points.geojson: the file holds no LineString (found: 1 Point); the centreline must be one LineString with [longitude, latitude, elevation] positions',
    );
    choose('notjson.geojson', 'name,x\n');
    expect((await screen.findByRole('alert')).textContent).toMatch(/^Cannot import notjson.geojson: the file is not JSON/);
  });

  it('imports a clean line as the surface, keeping the bed and the domain, as one undoable edit', async () => {
    const onClose = vi.fn();
    render(<GeojsonImportDialog onClose={onClose} />);
    choose('centreline.geojson', SHORT);
    expect(await screen.findByText(/LineString at the feature's geometry \("invented"\): 4 positions read; 2.66 km long/)).toBeTruthy();
    expect(screen.getByRole('img', { name: 'Preview of the imported profile' })).toBeTruthy();
    expect(screen.getByText(/The ice ends at the line's end/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Import' }));
    const { scenario, past, label } = useScenarioStore.getState();
    expect(scenario.bed).toEqual(demoScenario.bed);
    expect(scenario.grid).toEqual(demoScenario.grid);
    // The line, then the bed from 1 m past its end: no ice below the line.
    const end = scenario.surface?.[3][0] ?? NaN;
    expect(end).toBeCloseTo(2659.935, 2);
    expect(scenario.surface?.slice(0, 4).map((p) => p[1])).toEqual([3300, 3100, 2900, 2700]);
    expect(scenario.surface?.[4][0]).toBeCloseTo(end + 1, 9);
    const bedBeyond = demoScenario.bed.filter(([x]) => x > end + 1);
    expect(scenario.surface?.slice(5)).toEqual(bedBeyond);
    expect(scenario.surface?.[0][0]).toBe(0);
    expect(past).toHaveLength(1);
    expect(label).toBe('Import centreline centreline.geojson');
    expect(onClose).toHaveBeenCalledOnce();
    useScenarioStore.getState().undo();
    expect(useScenarioStore.getState().scenario).toBe(demoScenario);
  });

  it('warns when the line is longer than the domain and offers to lengthen the domain to whole cells', async () => {
    render(<GeojsonImportDialog onClose={() => {}} />);
    choose('long.geojson', LONG);
    expect((await screen.findByText(/The line is 15.976 km long but the domain ends at 12 km/)).getAttribute('role')).toBe('alert');
    fireEvent.click(screen.getByLabelText(/Make the domain 16 km long, to the end of the line \(whole cells of 50 m\)/));
    expect(screen.queryByText(/but the domain ends at/)).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Import' }));
    const { scenario } = useScenarioStore.getState();
    expect(scenario.grid).toEqual({ length: 16_000, spacing: 50 });
    expect(scenario.surface).toHaveLength(5);
  });

  it('reads a line drawn up-valley reversed when the box is ticked', async () => {
    render(<GeojsonImportDialog onClose={() => {}} />);
    choose('up.geojson', { ...SHORT.geometry, coordinates: [...SHORT.geometry.coordinates].reverse() });
    expect(await screen.findByText(/The line climbs from 2700 m to 3300 m/)).toBeTruthy();
    fireEvent.click(screen.getByLabelText(/Read the line reversed/));
    expect(screen.queryByText(/The line climbs/)).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Import' }));
    expect(useScenarioStore.getState().scenario.surface?.[0]).toEqual([0, 3300]);
  });

  it('opens from its button beside the CSV import in the editor', () => {
    render(<EditorPanels />);
    expect(screen.getByRole('button', { name: 'Import profile from CSV…' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Import centreline from GeoJSON…' }));
    expect(screen.getByRole('dialog', { name: 'Import a centreline (GeoJSON)' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('dialog')).toBeNull();
  });
});
