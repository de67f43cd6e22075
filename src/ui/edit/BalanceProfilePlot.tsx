/** Small plot of b(z), the balance against elevation, over the valley's elevation range at year 0. */
import { scaleLinear } from 'd3';
import { useMemo } from 'react';
import { createMassBalance } from '../../model/physics/massBalance/createMassBalance';
import { useScenarioStore } from '../../state/scenarioStore';
import { valleyElevationRange } from './defaultBalances';
import { SmallPlotAxes } from '../plot/SmallPlotAxes';

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
      <SmallPlotAxes width={W} height={H} margin={M} x={x} y={y} xTickCount={5} yTickCount={4} xTitle="Balance b (m w.e. a⁻¹)" yTitle="Elevation (m a.s.l.)" />
    </svg>
  );
}
