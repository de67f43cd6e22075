/**
 * `npm run bench`: speed of the flowline engine on this machine, for docs/performance.md.
 *  1. Demo spin-up from ice-free: implicit (default) against explicit, wall time, ratio, and the
 *     difference of the steady glaciers (terminus, volume).
 *  2. Growth with resolution: wall time for 20 model years from the spun-up demo at 100 ... 6400
 *     cells, per scheme, and the fitted exponent of time against cells.
 *  3. Experiment: 100 members of 300-year runs (warming ladder from the spun-up demo), one thread
 *     and two worker threads.
 *  4. Command-line start: `firnline run` on a tiny scenario, wall time of the whole process.
 *  5. Flux + update kernel of the explicit scheme: cell updates per second.
 *  6. Bed inversion: the spun-up demo glacier's surface inverted at 240 and 1,600 cells, without
 *     and with three thickness points (the fit repeats the inversion some 150 times).
 *  7. Calibration (`npm run bench calibration`): A fitted to six surface speeds of the spun-up
 *     demo (no time stepping), and the ELA fitted to its terminus and to a terminus record under
 *     the demo's warming (counting the spin-ups and runs); A with C together from the six speeds.
 *  8. Start-up (`npm run bench startup`): `firnline --help`, `firnline check` and `firnline run`
 *     (the demo without spin-up) against a bare `node -e 0`, runs interleaved, medians and ratios.
 *  9. Ensemble (`npm run bench ensemble`): `firnline experiment` on a 1,000-member Latin-hypercube
 *     ensemble of the demo (each member spun up, 300 years) with --jobs 2, wall time.
 * No pass/fail here: speed is checked by reading these figures, never by timed tests.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import demo from '../examples/demo-valley.json';
import { createFlowlineModel } from '../src/model/createFlowlineModel';
import type { SchemeName } from '../src/model/flowlineModel';
import { glacierExtent, iceVolume } from '../src/model/glacierExtent';
import type { Point, Scenario } from '../src/model/scenario';
import { FlowlineSimulation } from '../src/model/simulation';
import { validScenarioOf } from '../src/scenario/validateScenario';
import { spinUp } from '../src/model/spinUp';
import { invertBed, sampleCells, type InversionScenario } from '../src/model/inversion/invertBed';
import { calibrateParameter } from '../src/model/analysis/calibrateParameter';
import { calibrateJoint } from '../src/model/analysis/calibrateJoint';
import { terminusRecordOf } from '../src/model/analysis/calibrateClimate';
import { profileFields } from '../src/model/diagnostics';
import { createMassBudgetTotals, createStepWorkspace, explicitStep } from '../src/model/stepper/explicitStep';

const demoScenario = validScenarioOf(demo, 'examples/demo-valley.json');
const only = process.argv.slice(2);
const wanted = (section: string) => only.length === 0 || only.includes(section);

function seconds(start: number): number {
  return (performance.now() - start) / 1000;
}

function withScheme(scenario: Scenario, scheme: SchemeName): Scenario {
  return { ...scenario, numerics: { ...scenario.numerics, scheme } };
}

/** Demo spin-up from ice-free with one scheme. */
function demoSpinUp(scheme: SchemeName) {
  const model = createFlowlineModel(withScheme({ ...demoScenario, surface: undefined }, scheme));
  const start = performance.now();
  const result = spinUp(model, model.initialThickness);
  return {
    seconds: seconds(start),
    years: result.years,
    converged: result.converged,
    steps: result.steps,
    terminus: glacierExtent(model.grid, result.thickness).terminus,
    volume: iceVolume(model.grid, result.thickness),
    thickness: result.thickness,
    model,
  };
}

/** The spun-up demo glacier as a surface sketch, to start other grids from the same state. */
function spunUpSurface(): Point[] {
  const spun = demoSpinUp('implicit');
  return Array.from(spun.model.grid.x, (x, i) => [x, spun.model.grid.bed[i] + spun.thickness[i]] as Point);
}

function fixedSpan(cells: number, scheme: SchemeName, surface: Point[], years: number) {
  const scenario: Scenario = {
    ...withScheme(demoScenario, scheme),
    grid: { length: demoScenario.grid.length, spacing: demoScenario.grid.length / cells },
    surface,
  };
  const model = createFlowlineModel(scenario);
  const simulation = new FlowlineSimulation(model, model.initialThickness, () => 0);
  const start = performance.now();
  simulation.advanceTo(years);
  return { seconds: seconds(start), steps: simulation.steps, volume: simulation.volume() };
}

/** Least-squares slope of log(time) against log(cells). */
function fittedExponent(points: Array<[number, number]>): number {
  const xs = points.map(([c]) => Math.log(c));
  const ys = points.map(([, t]) => Math.log(t));
  const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
  const my = ys.reduce((a, b) => a + b, 0) / ys.length;
  let num = 0;
  let den = 0;
  xs.forEach((x, k) => {
    num += (x - mx) * (ys[k] - my);
    den += (x - mx) ** 2;
  });
  return num / den;
}

function experimentMembers(surface: Point[], count: number): Scenario[] {
  return Array.from({ length: count }, (_, k) => ({
    ...demoScenario,
    name: `member ${k}`,
    surface,
    spinup: false,
    warming: [[0, 0], [100, (3 * k) / (count - 1)]] as Point[],
    run: { years: 300, outputEvery: 10 },
  }));
}

async function runInWorkers(members: Scenario[], threads: number): Promise<number> {
  const start = performance.now();
  const shares = Array.from({ length: threads }, (_, t) => members.filter((_, k) => k % threads === t));
  await Promise.all(
    shares.map(
      (share) =>
        new Promise<void>((resolve, reject) => {
          const worker = new Worker(new URL('./bench-member-worker.mjs', import.meta.url));
          worker.once('message', () => {
            void worker.terminate();
            resolve();
          });
          worker.once('error', reject);
          worker.postMessage(share);
        }),
    ),
  );
  return seconds(start);
}

function kernelThroughput(cells: number): number {
  const scenario: Scenario = { ...demoScenario, grid: { length: demoScenario.grid.length, spacing: demoScenario.grid.length / cells } };
  const model = createFlowlineModel(scenario);
  const thickness = Float64Array.from(model.initialThickness);
  const work = createStepWorkspace(cells);
  const budget = createMassBudgetTotals();
  for (let k = 0; k < 2000; k++) explicitStep(model, thickness, 0, 1, 1, work, budget);
  let steps = 0;
  const start = performance.now();
  while (performance.now() - start < 1000) {
    for (let k = 0; k < 200; k++) explicitStep(model, thickness, 0, 1, 1, work, budget);
    steps += 200;
  }
  return (steps * cells) / seconds(start);
}

console.log(`Firnline benchmark — node ${process.version}, ${cpus().length} x ${cpus()[0]?.model ?? 'unknown CPU'}`);

if (wanted('spinup')) {
  console.log('\n1. Demo spin-up from ice-free (240 cells of 50 m), to the steady-state criterion');
  // Each timed twice, the faster kept: the first run also pays for compiling the code (JIT).
  const faster = <T extends { seconds: number }>(a: T, b: T) => (a.seconds <= b.seconds ? a : b);
  const implicit = faster(demoSpinUp('implicit'), demoSpinUp('implicit'));
  const explicit = faster(demoSpinUp('explicit'), demoSpinUp('explicit'));
  for (const [name, r] of [['implicit', implicit], ['explicit', explicit]] as const) {
    console.log(
      `   ${name.padEnd(8)} ${r.seconds.toFixed(3).padStart(7)} s  ${String(r.years).padStart(5)} model years  ` +
        `${String(r.steps).padStart(7)} steps  terminus ${r.terminus} m  volume ${r.volume.toExponential(4)} m^3`,
    );
  }
  console.log(
    `   speed-up ${(explicit.seconds / implicit.seconds).toFixed(1)}x; difference implicit - explicit: terminus ` +
      `${implicit.terminus - explicit.terminus} m, volume ${(((implicit.volume - explicit.volume) / explicit.volume) * 100).toFixed(2)} %`,
  );
}

if (wanted('resolution') || wanted('experiment')) {
  const surface = spunUpSurface();
  if (wanted('resolution')) {
    const span = 20;
    console.log(`\n2. Growth with resolution: ${span} model years from the spun-up demo (wall time, s)`);
    console.log('   cells  implicit   explicit');
    const rows: Record<SchemeName, Array<[number, number]>> = { implicit: [], explicit: [] };
    for (const cells of [100, 400, 1600, 6400]) {
      // Timed twice, the faster kept (the first run pays for compiling).
      const runImplicit = () => fixedSpan(cells, 'implicit', surface, span);
      const implicit = [runImplicit(), runImplicit()].sort((a, b) => a.seconds - b.seconds)[0];
      rows.implicit.push([cells, implicit.seconds]);
      // The explicit scheme at 6400 cells (1.9 m) would take hours; it is left out and said so.
      let explicitText = '   (not run: hours)';
      if (cells <= 1600) {
        const explicit = fixedSpan(cells, 'explicit', surface, span);
        rows.explicit.push([cells, explicit.seconds]);
        explicitText = `${explicit.seconds.toFixed(3).padStart(10)}  volume differs by ${(((implicit.volume - explicit.volume) / explicit.volume) * 100).toFixed(3)} %`;
      }
      console.log(`   ${String(cells).padStart(5)} ${implicit.seconds.toFixed(3).padStart(9)} ${explicitText}`);
    }
    console.log(
      `   fitted exponent (time ~ cells^p): implicit p = ${fittedExponent(rows.implicit).toFixed(2)}, ` +
        `explicit p = ${fittedExponent(rows.explicit).toFixed(2)}`,
    );
  }
  if (wanted('experiment')) {
    const members = experimentMembers(surface, 100);
    console.log('\n3. Experiment: 100 members x 300 model years (demo, warming 0-3 K by year 100), implicit');
    const one = await runInWorkers(members, 1);
    const two = await runInWorkers(members, 2);
    console.log(`   1 worker thread ${one.toFixed(2)} s; 2 worker threads ${two.toFixed(2)} s`);
  }
}

if (wanted('cli')) {
  const dir = mkdtempSync(join(tmpdir(), 'firnline-bench-'));
  const tiny: Scenario = {
    format: 'firnline-scenario',
    version: 1,
    grid: { length: 2000, spacing: 100 },
    bed: [[0, 3000], [2000, 2800]],
    surface: [[0, 3050], [1500, 2850], [1600, 2840]],
    ice: { n: 3, A: 2.4e-24 },
    massBalance: { model: 'linear', ela: 2950, ablationGradient: 0.006 },
    run: { years: 20, outputEvery: 5 },
  };
  writeFileSync(join(dir, 'tiny.json'), JSON.stringify(tiny));
  const times: number[] = [];
  for (let k = 0; k < 5; k++) {
    const start = performance.now();
    spawnSync(process.execPath, ['bin/firnline.mjs', 'run', join(dir, 'tiny.json'), '--out', join(dir, 'out'), '--quiet']);
    times.push(seconds(start));
  }
  times.sort((a, b) => a - b);
  console.log(`\n4. Command line on a tiny scenario (whole process, median of 5): ${times[2].toFixed(3)} s`);
}

/** User and system time of this process's waited-for children [s] (Linux /proc, 10 ms ticks), or NaN. */
function childrenCpuSeconds(): number {
  try {
    const fields = readFileSync('/proc/self/stat', 'utf8').split(') ')[1].split(' ');
    return (Number(fields[13]) + Number(fields[14])) / 100;
  } catch {
    return Number.NaN;
  }
}

if (only.includes('startup')) {
  const dir = mkdtempSync(join(tmpdir(), 'firnline-bench-'));
  writeFileSync(join(dir, 'demo-no-spinup.json'), JSON.stringify({ ...demo, spinup: false }));
  const commands: [string, string[]][] = [
    ['node -e 0', ['-e', '0']],
    ['firnline --help', ['bin/firnline.mjs', '--help']],
    ['firnline check demo', ['bin/firnline.mjs', 'check', 'examples/demo-valley.json']],
    ['firnline run demo, no spin-up', ['bin/firnline.mjs', 'run', join(dir, 'demo-no-spinup.json'), '--out', join(dir, 'out'), '--quiet']],
  ];
  const rounds = 21;
  const times = commands.map((): number[] => []);
  const cpu = commands.map(() => 0);
  // Interleaved, so that a busy machine slows every command alike.
  for (let r = 0; r < rounds; r++) {
    commands.forEach(([, args], k) => {
      const cpuBefore = childrenCpuSeconds();
      const start = performance.now();
      const result = spawnSync(process.execPath, args, { stdio: 'ignore' });
      if (result.status !== 0) throw new Error(`${commands[k][0]} failed`);
      times[k].push(seconds(start));
      cpu[k] += childrenCpuSeconds() - cpuBefore;
    });
  }
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  const bare = median(times[0]);
  console.log(`\n8. Start-up, whole process, median of ${rounds} interleaved runs (load average ${loadavg().map((l) => l.toFixed(1)).join(' ')})`);
  commands.forEach(([name], k) => {
    const m = median(times[k]);
    // CPU time (all threads, mean per run) varies less than wall time on a shared machine.
    const cpuText = Number.isNaN(cpu[0]) ? '' : `   cpu ${((cpu[k] / rounds) * 1000).toFixed(0).padStart(4)} ms  ${(cpu[k] / cpu[0]).toFixed(2)} x`;
    console.log(`   ${name.padEnd(30)} ${(m * 1000).toFixed(0).padStart(5)} ms  ${(m / bare).toFixed(2)} x node -e 0${cpuText}`);
  });
}

if (only.includes('ensemble')) {
  const dir = mkdtempSync(join(tmpdir(), 'firnline-bench-'));
  const experiment = {
    format: 'firnline-experiment',
    version: 1,
    name: 'Bench: 1,000-member ensemble of the demo valley (invented)',
    base: demo,
    ensemble: {
      members: 1000,
      seed: 2026,
      parameters: {
        '/ice/A': { distribution: 'lognormal', median: 2.4e-24, sigma: 0.3 },
        '/sliding/C': { distribution: 'uniform', min: 1e-14, max: 5e-14 },
        '/massBalance/ela': { distribution: 'normal', mean: 2780, sd: 40, min: 2700, max: 2860 },
      },
    },
  };
  writeFileSync(join(dir, 'ensemble.json'), JSON.stringify(experiment));
  const start = performance.now();
  const result = spawnSync(process.execPath, ['bin/firnline.mjs', 'experiment', join(dir, 'ensemble.json'), '--out', join(dir, 'out'), '--jobs', '2', '--quiet'], {
    encoding: 'utf8',
  });
  const wall = seconds(start);
  if (result.status !== 0) throw new Error(result.stderr);
  console.log(`\n9. Ensemble: 1,000 Latin-hypercube members of the demo (spin-up each, 300 years), --jobs 2: ${wall.toFixed(1)} s wall`);
  console.log(`   ${result.stdout.trim()}`);
  console.log(readFileSync(join(dir, 'out', 'percentiles.csv'), 'utf8'));
  rmSync(dir, { recursive: true, force: true });
}

if (wanted('kernel')) {
  console.log('\n5. Explicit flux + update kernel, demo valley resampled from its sketch');
  for (const cells of [100, 400, 1600]) {
    console.log(`   ${String(cells).padStart(5)} cells: ${kernelThroughput(cells).toExponential(3)} cell updates per second`);
  }
}

if (wanted('inversion')) {
  console.log('\n6. Bed inversion of the spun-up demo glacier (best of 3; the first run also compiles)');
  const spun = demoSpinUp('implicit');
  const { grid } = spun.model;
  const terminus = glacierExtent(grid, spun.thickness).terminus;
  const surface = Array.from(grid.x, (x, i) => [x, grid.bed[i] + spun.thickness[i]] as Point);
  const radar = [3000, 5500, 7500].map((x) => [x, sampleCells(spun.thickness, grid.spacing, x), 5] as [number, number, number]);
  const { bed: _bed, ...withoutBed } = demoScenario;
  for (const cells of [240, 1600]) {
    for (const withRadar of [false, true]) {
      const input: InversionScenario = {
        ...withoutBed,
        grid: { length: demoScenario.grid.length, spacing: demoScenario.grid.length / cells },
        surface,
        observations: { terminus, ...(withRadar ? { thickness: radar } : {}) },
      };
      const times: number[] = [];
      for (let k = 0; k < 3; k++) {
        const start = performance.now();
        invertBed(input);
        times.push(seconds(start));
      }
      console.log(`   ${String(cells).padStart(5)} cells, ${withRadar ? 'fitting A to 3 points' : 'A as given          '}: ${Math.min(...times).toFixed(4)} s`);
    }
  }
}

if (wanted('calibration')) {
  console.log('\n7. Calibration on the spun-up demo glacier (240 cells; best of 3 for the speed fit)');
  const spun = demoSpinUp('implicit');
  const { grid } = spun.model;
  const surface = Array.from(grid.x, (x, i) => [x, grid.bed[i] + spun.thickness[i]] as Point);
  const u = profileFields(spun.model, spun.thickness, 0).surfaceSpeed;
  const speeds = [1500, 2500, 3500, 4500, 5500, 6500].map((x) => {
    const value = sampleCells(u, grid.spacing, x);
    return [x, value, 0.05 * value] as [number, number, number];
  });
  const base: Scenario = { ...demoScenario, warming: [[0, 0]] };
  const speedTimes: number[] = [];
  let speedFit;
  for (let k = 0; k < 3; k++) {
    const start = performance.now();
    speedFit = calibrateParameter({ ...base, ice: { ...base.ice, A: 3 * 2.4e-24 }, surface, observations: { surfaceSpeed: speeds } }, '/ice/A');
    speedTimes.push(seconds(start));
  }
  console.log(`   A from 6 surface speeds (start 3 A): ${Math.min(...speedTimes).toFixed(4)} s, ${speedFit!.runs.count} diagnoses, A = ${speedFit!.value.toPrecision(4)}`);
  const terminus = glacierExtent(grid, spun.thickness).terminus;
  let start = performance.now();
  const terminusFit = calibrateParameter({ ...base, massBalance: { ...demoScenario.massBalance, ela: 2900 } as Scenario['massBalance'], observations: { terminus } }, '/massBalance/ela');
  console.log(`   ELA from the terminus (start 120 m high): ${seconds(start).toFixed(2)} s, ${terminusFit.runs.count} spin-ups, ELA = ${terminusFit.value.toFixed(1)} m`);
  const years = [25, 50, 75, 100];
  const { termini } = terminusRecordOf(demoScenario, years);
  start = performance.now();
  const recordFit = calibrateParameter(
    { ...demoScenario, massBalance: { ...demoScenario.massBalance, ela: 2700 } as Scenario['massBalance'], observations: { terminus: years.map((y, k) => [y, termini[k]] as Point) } },
    '/massBalance/ela',
  );
  console.log(`   ELA from a terminus record (4 points to year 100, start 80 m low): ${seconds(start).toFixed(2)} s, ${recordFit.runs.count} spin-ups + runs, ELA = ${recordFit.value.toFixed(1)} m`);
  start = performance.now();
  const jointFit = calibrateJoint(
    { ...base, ice: { ...base.ice, A: 3 * 2.4e-24 }, sliding: { C: 3e-14 / 4, m: 3 }, surface, observations: { surfaceSpeed: speeds } },
    ['/ice/A', '/sliding/C'],
  );
  console.log(
    `   A with C from 6 surface speeds (start 3 A, C / 4; Nelder-Mead): ${seconds(start).toFixed(4)} s, ${jointFit.runs.count} diagnoses, ` +
      `A = ${jointFit.parameters[0].value.toPrecision(4)}, C = ${jointFit.parameters[1].value.toPrecision(4)}, correlation ${jointFit.correlation.toFixed(2)}`,
  );
}
