// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import { UndoRedoBar } from '../../../src/ui/edit/UndoRedoBar';
import { useScenarioStore, demoScenario } from '../../../src/state/scenarioStore';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

function edit(ela: number) {
  const s = useScenarioStore.getState().scenario;
  act(() => useScenarioStore.getState().apply({ ...s, massBalance: { ...s.massBalance, ela } as typeof s.massBalance }, `Set ELA ${ela}`));
}
const ela = () => (useScenarioStore.getState().scenario.massBalance as { ela: number }).ela;

describe('undo and redo', () => {
  it('buttons say what will be undone and redone', () => {
    render(<UndoRedoBar />);
    expect((screen.getByRole('button', { name: 'Undo' }) as HTMLButtonElement).disabled).toBe(true);
    fireEvent.click(screen.getByRole('button', { name: 'Undo' }));
    expect(useScenarioStore.getState().scenario).toBe(demoScenario);
    edit(2900);
    fireEvent.click(screen.getByRole('button', { name: 'Undo: Set ELA 2900' }));
    expect(ela()).toBe(2780);
    fireEvent.click(screen.getByRole('button', { name: 'Redo: Set ELA 2900' }));
    expect(ela()).toBe(2900);
  });

  it('Ctrl+Z undoes, Ctrl+Shift+Z and Ctrl+Y redo, Cmd+Z works on a Mac', () => {
    render(<UndoRedoBar />);
    edit(2900);
    edit(3000);
    fireEvent.keyDown(document.body, { key: 'z', ctrlKey: true });
    expect(ela()).toBe(2900);
    fireEvent.keyDown(document.body, { key: 'z', metaKey: true });
    expect(ela()).toBe(2780);
    fireEvent.keyDown(document.body, { key: 'Z', ctrlKey: true, shiftKey: true });
    expect(ela()).toBe(2900);
    fireEvent.keyDown(document.body, { key: 'y', ctrlKey: true });
    expect(ela()).toBe(3000);
  });

  it('leaves Ctrl+Z to the text field while typing', () => {
    render(
      <>
        <UndoRedoBar />
        <input aria-label="Some field" type="text" />
        <input aria-label="A checkbox" type="checkbox" />
      </>,
    );
    edit(2900);
    fireEvent.keyDown(screen.getByLabelText('Some field'), { key: 'z', ctrlKey: true });
    expect(ela()).toBe(2900);
    fireEvent.keyDown(screen.getByLabelText('A checkbox'), { key: 'z', ctrlKey: true });
    expect(ela()).toBe(2780);
  });
});
