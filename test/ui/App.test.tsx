// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen } from '@testing-library/react';
import { App } from '../../src/ui/App';
import { demoScenario } from '../../src/state/scenarioStore';

afterEach(cleanup);

describe('App', () => {
  it('shows the product and scenario names, the profile, the parameters and the caution', () => {
    render(<App />);
    expect(screen.getByRole('heading', { level: 1, name: 'Firnline' })).toBeTruthy();
    expect(screen.getByText(demoScenario.name ?? '')).toBeTruthy();
    expect(screen.getByRole('img', { name: 'Long profile of the flowline' })).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Parameters' })).toBeTruthy();
    expect(screen.getByText('Grid spacing')).toBeTruthy();
    const caution = screen.getByRole('note').textContent ?? '';
    expect(caution).toMatch(/not a hazard assessment/);
    expect(caution).toMatch(/local authorities and licensed professional practice/);
  });
});
