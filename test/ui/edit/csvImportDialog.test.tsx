// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { CsvImportDialog } from '../../../src/ui/edit/CsvImportDialog';
import { useScenarioStore, demoScenario } from '../../../src/state/scenarioStore';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

function choose(name: string, text: string) {
  const input = screen.getByLabelText('CSV file') as HTMLInputElement;
  fireEvent.change(input, { target: { files: [new File([text], name, { type: 'text/csv' })] } });
}

const BAD = 'distance_km;bed_m;surface_m\n0;3300;3380\n2,5;2950;3100\n5;abc;2700\n5;2600;2700\n10;2100;2100\n';

describe('CsvImportDialog', () => {
  it('lists bad rows with their line numbers and applies nothing until the user leaves them out and imports', async () => {
    const onClose = vi.fn();
    render(<CsvImportDialog onClose={onClose} />);
    choose('survey.csv', BAD);
    const list = await screen.findByRole('list', { name: 'Rows that could not be read' });
    const items = within(list).getAllByRole('listitem').map((li) => li.textContent);
    expect(items).toEqual(['Line 4: bed "abc" is not a number']);
    const importButton = screen.getByRole('button', { name: 'Import' }) as HTMLButtonElement;
    expect(importButton.disabled).toBe(true);
    fireEvent.click(importButton);
    expect(useScenarioStore.getState().scenario).toBe(demoScenario);
    // The preview is shown before anything is applied.
    expect(screen.getByRole('img', { name: 'Preview of the imported profile' })).toBeTruthy();
    expect(screen.getByText(/Read as kilometres, as the header states/)).toBeTruthy();

    fireEvent.click(screen.getByLabelText(/Leave out the 1 unreadable row/));
    expect(importButton.disabled).toBe(false);
    fireEvent.click(importButton);
    const { scenario, past, label } = useScenarioStore.getState();
    expect(scenario.bed).toEqual([[0, 3300], [2500, 2950], [5000, 2600], [10_000, 2100]]);
    expect(scenario.surface).toEqual([[0, 3380], [2500, 3100], [5000, 2700], [10_000, 2100]]);
    expect(scenario.grid).toEqual({ length: 10_000, spacing: 50 });
    expect(past).toHaveLength(1);
    expect(label).toBe('Import profile survey.csv');
    expect(onClose).toHaveBeenCalledOnce();
  });

  it('imports a clean file directly and lets the user change the detected unit', async () => {
    render(<CsvImportDialog onClose={() => {}} />);
    choose('clean.csv', '0,3300\n4,2800\n8,2300\n');
    const unit = (await screen.findByLabelText(/Distances in/)) as HTMLSelectElement;
    expect(screen.getByText(/Read as kilometres, guessed: the largest distance, 8, is below 500/)).toBeTruthy();
    fireEvent.change(unit, { target: { value: 'm' } });
    expect(screen.getByText(/Read as metres, as chosen/)).toBeTruthy();
    // 8 m cannot hold 50 m cells: the preview states the spacing that the import would use.
    expect(screen.getByText(/Domain 0 to 0.008 km in 2 cells of 4 m/)).toBeTruthy();
    fireEvent.change(unit, { target: { value: 'km' } });
    fireEvent.click(screen.getByRole('button', { name: 'Import' }));
    expect(useScenarioStore.getState().scenario.bed).toEqual([[0, 3300], [4000, 2800], [8000, 2300]]);
    expect(useScenarioStore.getState().scenario.surface).toBeUndefined();
  });

  it('refuses an empty file and binary junk with the reason', async () => {
    render(<CsvImportDialog onClose={() => {}} />);
    choose('empty.csv', '');
    expect((await screen.findByRole('alert')).textContent).toMatch(/Cannot import empty.csv: the file is empty/);
    choose('photo.jpg', '\u00ff\u00d8\u00ff\u0000JFIF\u0000');
    await waitFor(() => expect(screen.getByRole('alert').textContent).toMatch(/Cannot import photo.jpg: the file is not text/));
    expect((screen.getByRole('button', { name: 'Import' }) as HTMLButtonElement).disabled).toBe(true);
    expect(useScenarioStore.getState().past).toHaveLength(0);
  });

  it('refuses a file over 20 MB from its size, before reading it', async () => {
    render(<CsvImportDialog onClose={() => {}} />);
    choose('lidar.csv', '0,3300\n'.repeat(3_000_000));
    expect((await screen.findByRole('alert')).textContent).toMatch(/Cannot import lidar.csv: lidar.csv is 21.0 MB; the largest profile accepted is 20 MB/);
    expect(useScenarioStore.getState().past).toHaveLength(0);
  });
});
