// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen } from '@testing-library/react';
import type { FinishedMember } from '../../../src/ui/experiments/finishedMembers';
import { memberLabel } from '../../../src/ui/experiments/finishedMembers';
import { FinalProfilesChart } from '../../../src/ui/experiments/FinalProfilesChart';
import { MemberSeriesChart } from '../../../src/ui/experiments/MemberSeriesChart';
import { memberStyle, memberStyler } from '../../../src/ui/experiments/memberStyles';

afterEach(cleanup);

/** A member whose length falls linearly from 8 km by `rate` km per output, over a flat-topped bed. */
function member(index: number, group: number, rate: number): FinishedMember {
  const times = Float64Array.from([0, 10, 20, 30]);
  const x = Float64Array.from({ length: 10 }, (_, i) => (i + 0.5) * 1000);
  const bed = x.map((xi) => 3000 - xi / 10);
  const thickness = x.map((xi) => (xi < 8000 - index * 1000 ? 100 : 0));
  return {
    index,
    name: `${index + 1}_m`,
    label: `member ${index + 1}`,
    group,
    ensembleGroup: group,
    style: memberStyle(index),
    result: {
      status: 'ok',
      series: { times, volume: times.map(() => 1e9), area: times.map(() => 1e6), length: times.map((_, k) => 8000 - rate * 1000 * k), terminus: times.map(() => 8000) },
      finalProfile: { x, bed, thickness, surface: bed.map((b, i) => b + thickness[i]), startSurface: bed.map((b) => b + 100), lengthM: 10_000 },
      outcome: {} as never,
      outcomeRow: '',
      warnings: [],
    },
  };
}

describe('member charts', () => {
  const members = [member(0, 0, 0.5), member(1, 0, 1), member(2, 1, 1.5), member(3, 1, 2)];
  const length = (m: FinishedMember, k: number) => m.result.series.length[k] / 1000;

  it('draws one line per member in its own style, titled by member, and axes with units', () => {
    render(<MemberSeriesChart title="Glacier length" yTitle="Length (km)" members={members} value={length} bands={false} years={30} />);
    const chart = screen.getByRole('img', { name: 'Glacier length: 4 members' });
    const lines = [...chart.querySelectorAll('path.member-line')];
    expect(lines.map((l) => l.getAttribute('stroke'))).toEqual(['#0072b2', '#d55e00', '#009e73', '#cc79a7']);
    expect(lines.map((l) => l.querySelector('title')!.textContent)).toEqual(['member 1 (1_m)', 'member 2 (2_m)', 'member 3 (3_m)', 'member 4 (4_m)']);
    expect(chart.querySelectorAll('path.spread-band')).toHaveLength(0);
    expect(chart.textContent).toContain('Model year (a)');
    expect(chart.textContent).toContain('Length (km)');
  });

  it('with a sweep, shades the min–max range of each variant’s members', () => {
    render(<MemberSeriesChart title="Glacier length" yTitle="Length (km)" members={members} value={length} bands years={30} />);
    const bands = [...screen.getByRole('img', { name: 'Glacier length: 4 members' }).querySelectorAll('path.spread-band')];
    expect(bands.map((b) => b.getAttribute('data-band'))).toEqual(['0', '1']);
    // Four times along the top edge and four back along the bottom: eight corners, closed.
    for (const b of bands) expect(b.getAttribute('d')).toMatch(/^M[\d.,]+(L[\d.,]+){7}Z$/);
  });

  it('for an ensemble, shades the 5–95 % and 17–83 % percentiles of each ensemble group instead of the range', () => {
    render(<MemberSeriesChart title="Glacier length" yTitle="Length (km)" members={members} value={length} bands={false} percentileBands years={30} />);
    const chart = screen.getByRole('img', { name: 'Glacier length: 4 members' });
    expect(chart.querySelectorAll('path.spread-band')).toHaveLength(0);
    const bands = [...chart.querySelectorAll('path.percentile-band')];
    expect(bands.map((b) => `${b.getAttribute('data-band')} ${b.getAttribute('class')}`)).toEqual([
      '0 percentile-band p5-p95',
      '0 percentile-band p17-p83',
      '1 percentile-band p5-p95',
      '1 percentile-band p17-p83',
    ]);
    for (const b of bands) expect(b.getAttribute('d')).toMatch(/^M[\d.,]+(L[\d.,]+){7}Z$/);
  });

  it('can draw fewer lines than the members its bands cover', () => {
    render(<MemberSeriesChart title="Glacier length" yTitle="Length (km)" members={members.slice(0, 1)} bandMembers={members} value={length} bands years={30} />);
    const chart = screen.getByRole('img', { name: 'Glacier length: 1 member' });
    expect(chart.querySelectorAll('path.member-line')).toHaveLength(1);
    expect(chart.querySelectorAll('path.spread-band')).toHaveLength(2);
  });

  it('draws the final surfaces over the bed, and the year-0 surface only when all members share it', () => {
    const { unmount } = render(<FinalProfilesChart members={members} />);
    const chart = screen.getByRole('img', { name: /for 4 members, over the bed/ });
    expect(chart.querySelectorAll('path.member-line')).toHaveLength(4);
    expect(chart.querySelectorAll('[data-layer="start-surface"]')).toHaveLength(1);
    expect(chart.textContent).toContain('Elevation (m a.s.l.)');
    expect(chart.textContent).toMatch(/Vertical exaggeration ×\d+\.\d/);
    unmount();
    const differentStart = member(4, 2, 1);
    differentStart.result.finalProfile.startSurface = differentStart.result.finalProfile.bed.map((b) => b + 50);
    render(<FinalProfilesChart members={[...members, differentStart]} />);
    expect(screen.getByRole('img', { name: /for 5 members/ }).querySelectorAll('[data-layer="start-surface"]')).toHaveLength(0);
  });

  it('colours variants crossed with a sweep by variant, and styles the swept values by dash', () => {
    const plan = [0, 0, 0, 1, 1, 1].map((variantIndex, index) => ({ index, variantIndex }));
    const crossed = memberStyler(plan, true);
    expect(plan.map((m) => crossed(m.index))).toEqual([
      { colour: '#0072b2', dash: '' },
      { colour: '#0072b2', dash: '9 5' },
      { colour: '#0072b2', dash: '2 4' },
      { colour: '#d55e00', dash: '' },
      { colour: '#d55e00', dash: '9 5' },
      { colour: '#d55e00', dash: '2 4' },
    ]);
    // Without a sweep (or with one variant) every member has its own colour.
    const own = memberStyler(plan, false);
    expect(plan.map((m) => own(m.index).colour)).toEqual(['#0072b2', '#d55e00', '#009e73', '#cc79a7', '#e69f00', '#56b4e9']);
    expect(memberStyler(plan.slice(0, 3), true)).toBe(memberStyle);
  });

  it('labels members by variant and swept values', () => {
    expect(memberLabel({ variantName: '+1 K by year 80', sweep: [{ pointer: '/ice/A', valueIndex: 0, value: 1.2e-24 }] })).toBe('+1 K by year 80, A = 1.2e-24');
    expect(memberLabel({ variantName: undefined, sweep: [{ pointer: '/bed/3/1', valueIndex: 1, value: 2400 }] })).toBe('base, /bed/3/1 = 2400');
  });
});
