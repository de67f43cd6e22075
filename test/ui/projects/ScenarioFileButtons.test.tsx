// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { demoScenario, useScenarioStore } from '../../../src/state/scenarioStore';
import { ScenarioFileButtons } from '../../../src/ui/projects/ScenarioFileButtons';
import { quorrelCirque } from '../../helpers/quorrelCirque';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

function chooseFile(name: string, text: string) {
  const input = screen.getByLabelText('Scenario file to open') as HTMLInputElement;
  const file = new File([text], name, { type: 'application/json' });
  fireEvent.change(input, { target: { files: [file] } });
}

describe('ScenarioFileButtons', () => {
  it('opens a valid scenario file as one undoable edit', async () => {
    render(<ScenarioFileButtons />);
    chooseFile('quorrel.json', JSON.stringify(quorrelCirque()));
    await waitFor(() => expect(useScenarioStore.getState().scenario.name).toBe('Quorrel cirque (invented)'));
    expect(useScenarioStore.getState().label).toBe('Open quorrel.json');
    expect(screen.getByRole('status').textContent).toMatch(/Opened quorrel.json/);
    useScenarioStore.getState().undo();
    expect(useScenarioStore.getState().scenario).toBe(demoScenario);
  });

  it('refuses a file with an invalid value whole, naming the key and what is allowed', async () => {
    render(<ScenarioFileButtons />);
    chooseFile('bad.json', JSON.stringify(quorrelCirque({ grid: { length: 3000, spacing: -50 } })));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toMatch(/bad.json was not opened/);
    expect(alert.textContent).toMatch(/\/grid\/spacing/);
    expect(useScenarioStore.getState().scenario).toBe(demoScenario);
  });

  it('refuses text that is not JSON, with the line and column', async () => {
    render(<ScenarioFileButtons />);
    chooseFile('broken.json', '{\n  "format": "firnline-scenario",\n  "version": 1,,\n}');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toMatch(/line 3/);
    expect(useScenarioStore.getState().scenario).toBe(demoScenario);
  });
});
