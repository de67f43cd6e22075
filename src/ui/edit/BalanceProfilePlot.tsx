/** Small plot of b(z), the balance against elevation, over the valley's elevation range at year 0. */
import { scaleLinear } from 'd3';
import { useMemo } from 'react';
import { createMassBalance } from '../../model/physics/massBalance/createMassBalance';
import { useScenarioStore } from '../../state/scenarioStore';
import { valleyElevationRange } from './defaultBalances';

const W = 440;
const H = 250;
const M = { top: 12, right: 14, bottom: 44, left: 62 };

export function BalanceProfilePlot() {
  const scenario = useScenarioStore((s) => s.scenario);
  const { points, x, y, ela } = useMemo(() => {
    const [lo, hi] = valleyElevationRange(scenario);
    const model = createMassBalance(scenario.massBalance);
    const pts: [number, number][] = [];
    for (let i = 0; i <= 60; i++) {
      const z = lo + ((hi - lo) * i) / 60;
      pts.push([model.balanceAt(z, 0), z]);
    }
    const bs = pts.map(([b]) => b);
    const bMax = Math.max(1, ...bs.map(Math.abs));
    const xs = scaleLinear().domain([Math.min(-bMax, ...bs), Math.max(bMax, ...bs)]).range([M.left, W - M.right]).nice();
    const ys = scaleLinear().domain([lo, hi]).range([H - M.bottom, M.top]).nice();
    return { points: pts, x: xs, y: ys, ela: model.equilibriumLineAltitude(0) };
  }, [scenario]);
  const d = points.map(([b, z], i) => `${i ? 'L' : 'M'}${x(b)},${y(z)}`).join('');
  return (
    <svg className="small-plot" viewBox={`0 0 ${W} ${H}`} role="img" aria-label="Mass balance against elevation at year 0">
      <line className="zero" x1={x(0)} x2={x(0)} y1={M.top} y2={H - M.bottom} />
      {Number.isFinite(ela) && ela >= y.domain()[0] && ela <= y.domain()[1] && (
        <g>
          <line className="ela-line" x1={M.left} x2={W - M.right} y1={y(ela)} y2={y(ela)} />
          <text className="ela-label" x={M.left + 4} y={y(ela) - 6}>
            ELA {Math.round(ela)} m
          </text>
        </g>
      )}
      <path className="balance-line" d={d} />
      <g className="axis">
        <line x1={M.left} x2={W - M.right} y1={H - M.bottom} y2={H - M.bottom} />
        <line x1={M.left} x2={M.left} y1={M.top} y2={H - M.bottom} />
        {x.ticks(5).map((t) => (
          <text key={t} x={x(t)} y={H - M.bottom + 18} textAnchor="middle">
            {String(t).replace('-', '\u2212')}
          </text>
        ))}
        {y.ticks(4).map((t) => (
          <text key={t} x={M.left - 6} y={y(t)} dy="0.35em" textAnchor="end">
            {t}
          </text>
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle">
          Balance b (m w.e. a⁻¹)
        </text>
        <text transform={`translate(14,${(M.top + H - M.bottom) / 2}) rotate(-90)`} textAnchor="middle">
          Elevation (m a.s.l.)
        </text>
      </g>
    </svg>
  );
}
