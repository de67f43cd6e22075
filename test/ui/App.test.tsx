// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen } from '@testing-library/react';
import { App } from '../../src/ui/App';
import { demoScenario } from '../../src/state/scenarioStore';

afterEach(cleanup);

describe('App', () => {
  it('shows the product and project names, run controls, the profile, numbers, projects, parameters and the caution', () => {
    render(<App />);
    expect(screen.getByRole('heading', { level: 1, name: 'Firnline' })).toBeTruthy();
    expect(screen.getByLabelText('Project').textContent).toBe(demoScenario.name);
    expect(screen.getByRole('img', { name: 'Long profile of the flowline' })).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Parameters' })).toBeTruthy();
    expect(screen.getByText('Grid spacing')).toBeTruthy();
    // Beside the results and at the foot of the page.
    const cautions = screen.getAllByRole('note');
    expect(cautions).toHaveLength(2);
    for (const note of cautions) {
      expect(note.textContent).toMatch(/not a hazard assessment/);
      expect(note.textContent).toMatch(/local authorities and licensed professional practice/);
    }
    expect(screen.getByRole('button', { name: 'Run' })).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Glacier at the selected year' })).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Projects' })).toBeTruthy();
  });
});
