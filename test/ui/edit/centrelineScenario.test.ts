import { describe, expect, it } from 'vitest';
import { centrelineScenario } from '../../../src/ui/edit/centrelineScenario';
import { demoScenario } from '../../../src/state/scenarioStore';
import type { CentrelinePoint } from '../../../src/csvImport/geojsonCentreline';

const point = (distanceM: number, elevation: number, index: number): CentrelinePoint => ({ index, longitude: 0, latitude: 0, elevation, distanceM });

describe('centrelineScenario', () => {
  const s = { ...demoScenario, grid: { length: 1000, spacing: 100 }, bed: [[0, 2000], [500, 1900], [800, 1850]] as [number, number][] };

  it('keeps bed and domain; below a line that ends inside the domain the surface follows the bed', () => {
    const r = centrelineScenario(s, [point(0, 2100, 0), point(420, 1990, 1)], { domainToLine: false });
    expect(r.longerThanDomain).toBe(false);
    expect(r.scenario.grid).toEqual({ length: 1000, spacing: 100 });
    expect(r.scenario.bed).toBe(s.bed);
    // Bed at 421 m: 2000 - 100 * 421/500 = 1915.8 m.
    expect(r.scenario.surface).toEqual([[0, 2100], [420, 1990], [421, 1915.8], [500, 1900], [800, 1850]]);
    expect(r.domainToLineEnd).toBe(500);
  });

  it('warns of a line longer than the domain and, when asked, ends the domain at the line in whole cells', () => {
    const line = [point(0, 2100, 0), point(1234, 1800, 1)];
    const kept = centrelineScenario(s, line, { domainToLine: false });
    expect(kept.longerThanDomain).toBe(true);
    expect(kept.scenario.surface).toEqual([[0, 2100], [1234, 1800]]);
    const longer = centrelineScenario(s, line, { domainToLine: true });
    expect(longer.longerThanDomain).toBe(false);
    expect(longer.scenario.grid).toEqual({ length: 1300, spacing: 100 });
    expect(longer.notes.join(' ')).toMatch(/The bed's last point is at 0.8 km; beyond it the bed is held at its last elevation/);
  });
});
