// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { App } from '../../src/ui/App';
import { demoScenario } from '../../src/state/scenarioStore';

afterEach(cleanup);

describe('App', () => {
  it('shows the product and project names, run controls, the profile, the parameter column, the views behind tabs and the caution', () => {
    render(<App />);
    expect(screen.getByRole('heading', { level: 1, name: 'Firnline' })).toBeTruthy();
    expect(screen.getByLabelText('Project').textContent).toBe(demoScenario.name);
    expect(screen.getByRole('img', { name: 'Long profile of the flowline' })).toBeTruthy();
    // The parameters have a column of their own; the supporting views sit behind tabs.
    expect(screen.getByRole('region', { name: 'Parameters' })).toBeTruthy();
    expect(screen.getByRole('tablist', { name: 'Scenario settings' })).toBeTruthy();
    const views = screen.getByRole('tablist', { name: 'Results and tools' });
    expect(Array.from(views.querySelectorAll('[role=tab]')).map((t) => t.textContent)).toEqual([
      'Numbers',
      'Speed and stress',
      'Through time',
      'Analyses',
      'Export',
      'Projects',
      'Summary',
    ]);
    fireEvent.click(screen.getByRole('tab', { name: 'Summary' }));
    expect(screen.getByRole('heading', { name: 'Parameters' })).toBeTruthy();
    expect(screen.getByText('Grid spacing')).toBeTruthy();
    // At the foot of the screen, always in view.
    const cautions = screen.getAllByRole('note');
    expect(cautions).toHaveLength(1);
    for (const note of cautions) {
      expect(note.textContent).toMatch(/not a hazard assessment/);
      expect(note.textContent).toMatch(/local authorities and licensed professional practice/);
    }
    expect(screen.getByRole('button', { name: 'Run' })).toBeTruthy();
    expect(screen.queryByRole('heading', { name: 'Projects' })).toBeNull();
    fireEvent.click(screen.getByRole('tab', { name: 'Projects' }));
    expect(screen.getByRole('heading', { name: 'Projects' })).toBeTruthy();
    fireEvent.click(screen.getByRole('tab', { name: 'Numbers' }));
    expect(screen.getByRole('heading', { name: 'Glacier at the selected year' })).toBeTruthy();
  });
});
