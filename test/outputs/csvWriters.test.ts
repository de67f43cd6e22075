/**
 * The CSV writers: exact headers, one row per cell and output time, empty fields for non-finite
 * values, and text that a standard CSV reader (RFC 4180, read here with d3's csvParse) turns back
 * into exactly the rounded numbers.
 */
import { csvParse } from 'd3';
import { describe, expect, it } from 'vitest';
import {
  COORDINATE_DIGITS,
  csvNumber,
  FIELD_DIGITS,
  profileRows,
  profilesCsv,
  seriesCsv,
} from '../../src/outputs/csvWriters';
import { runOutputs } from '../../src/outputs/runOutputs';
import { validateScenario } from '../../src/scenario/validateScenario';
import { glacierNumbers, profileFields, type GlacierNumbers, type ProfileFields } from '../../src/model/diagnostics';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';
import { quorrelCirque } from '../helpers/quorrelCirque';

const PROFILES_COLUMNS =
  't_yr,x_m,bed_m,surface_m,thickness_m,width_m,surface_width_m,u_surface_m_a,u_sliding_m_a,tau_d_kPa,strain_rate_a,crevasse_depth_m,balance_mwe_a';
const SERIES_COLUMNS = 't_yr,volume_m3,area_m2,length_m,terminus_m,ela_m,aar,max_thickness_m,max_u_surface_m_a,warming_K,frontal_ablation_m3_a';

const rounded = (v: number, digits: number) => Number(v.toPrecision(digits));

/** The Quorrel cirque test glacier, validated, after `change`. */
function cirque(change: (s: Record<string, unknown>) => void = () => {}): Scenario {
  const input = quorrelCirque();
  change(input);
  const result = validateScenario(input);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.scenario;
}

function outputsOf(scenario: Scenario) {
  const report = runScenario(scenario);
  return { report, outputs: runOutputs(report, { scenario, firnlineVersion: 'test', validatorWarnings: [] }) };
}

/** Hand-made fields with awkward values: NaN, infinities, -0, tiny and huge magnitudes. */
function awkwardProfile(): ProfileFields {
  const column = (...v: number[]) => Float64Array.from(v);
  return {
    x: column(50, 150, 250),
    bed: column(2993.3333333333, -0, 1e-9),
    surface: column(3073.123456789, Number.NaN, 123456789.123),
    thickness: column(79.666666666, 0, 1e-300),
    width: column(1, Number.POSITIVE_INFINITY, 450),
    surfaceWidth: column(1.23456789, Number.NaN, 612.34567891),
    surfaceSpeed: column(-2.9778790123, 0, 1e25),
    slidingSpeed: column(0, Number.NEGATIVE_INFINITY, 3.3e-7),
    drivingStress: column(99.566923, 0, 0.1),
    strainRate: column(-0.00098433751234, 1e-12, -5e-8),
    crevasseDepth: column(0, 0, 12.3456789),
    balance: column(1.561, -0.30000000000000004, 2 / 3),
  };
}

describe('csvNumber', () => {
  it('writes non-finite values as an empty field and -0 as 0', () => {
    expect(csvNumber(Number.NaN, 7)).toBe('');
    expect(csvNumber(Number.POSITIVE_INFINITY)).toBe('');
    expect(csvNumber(Number.NEGATIVE_INFINITY, 7)).toBe('');
    expect(csvNumber(-0, 7)).toBe('0');
    expect(csvNumber(-1e-30, 7)).toBe('-1e-30');
  });

  it('rounds to the given significant figures and parses back to exactly that number', () => {
    for (const v of [2 / 3, -1234.56789, 1e-7 / 3, 6.02214076e23, 2993.3333333, 0.30000000000000004]) {
      for (const digits of [FIELD_DIGITS, COORDINATE_DIGITS]) {
        expect(Number(csvNumber(v, digits))).toBe(rounded(v, digits));
      }
      expect(Number(csvNumber(v))).toBe(v);
    }
  });

  it('writes the same text as String(Number(v.toPrecision(d)) + 0) for any double', () => {
    // The reference is the definition in the header; csvNumber takes a shorter road to it.
    const reference = (v: number, digits: number) => String(Number(v.toPrecision(digits)) + 0);
    const edges = [
      1e21, -1e21, 9.9999995e20, 9.99999949e20, 9999999.5, 9999999.4, 1e7, 1234560, 1e-7, 9.9999995e-7,
      1.0000005e-6, 1e-6, 999999.95, 0.1 + 0.2, 5e-324, -2.2250738585072014e-308, 1e-300, 1.7976931348623157e308, 1e300, 123456789012,
    ];
    let state = 20261203;
    // A fixed linear congruential sequence (Numerical Recipes constants), so a failure repeats.
    const uniform = () => (state = (Math.imul(state, 1664525) + 1013904223) >>> 0) / 2 ** 32;
    const values = [...edges, ...edges.map((v) => -v)];
    for (let k = 0; k < 300_000; k++) values.push((uniform() - 0.5) * 10 ** (uniform() * 640 - 320));
    const buffer = new DataView(new ArrayBuffer(8));
    for (let k = 0; k < 200_000; k++) {
      // Arbitrary bit patterns: every exponent, subnormals included.
      buffer.setUint32(0, (uniform() * 2 ** 32) >>> 0);
      buffer.setUint32(4, (uniform() * 2 ** 32) >>> 0);
      values.push(buffer.getFloat64(0));
    }
    let compared = 0;
    for (const v of values) {
      if (v === 0 || !Number.isFinite(v)) continue;
      for (const digits of [FIELD_DIGITS, COORDINATE_DIGITS]) {
        if (csvNumber(v, digits) !== reference(v, digits)) expect(`${v} to ${digits} digits: ${csvNumber(v, digits)}`).toBe(reference(v, digits));
        compared++;
      }
    }
    expect(compared).toBeGreaterThan(900_000);
  });

  it('keeps ordinary magnitudes free of exponents', () => {
    expect(csvNumber(2993.3333333, FIELD_DIGITS)).toBe('2993.333');
    expect(csvNumber(1494384016.750709)).toBe('1494384016.750709');
    expect(csvNumber(0.30000000000000004, COORDINATE_DIGITS)).toBe('0.3');
  });
});

describe('profiles.csv', () => {
  it('has the exact header, "\\n" line ends and empty fields for non-finite values', () => {
    const text = profilesCsv([{ time: 12.5, fields: awkwardProfile() }]);
    const lines = text.split('\n');
    expect(lines[0]).toBe(PROFILES_COLUMNS);
    expect(text.endsWith('\n')).toBe(true);
    expect(text).not.toContain('\r');
    expect(lines).toHaveLength(1 + 3 + 1); // header, three cells, and "" after the final "\n"
    expect(text).not.toMatch(/NaN|Infinity|#/);
    const rows = csvParse(text);
    expect(rows[1].surface_m).toBe('');
    expect(rows[1].width_m).toBe('');
    expect(rows[1].surface_width_m).toBe('');
    expect(rows[1].u_sliding_m_a).toBe('');
    expect(rows[1].bed_m).toBe('0');
  });

  it('parses back to the rounded numbers, column by column', () => {
    const p = awkwardProfile();
    const rows = csvParse(profilesCsv([{ time: 0.30000000000000004, fields: p }]));
    const columns: [string, Float64Array][] = [
      ['bed_m', p.bed],
      ['surface_m', p.surface],
      ['thickness_m', p.thickness],
      ['width_m', p.width],
      ['surface_width_m', p.surfaceWidth],
      ['u_surface_m_a', p.surfaceSpeed],
      ['u_sliding_m_a', p.slidingSpeed],
      ['tau_d_kPa', p.drivingStress],
      ['strain_rate_a', p.strainRate],
      ['crevasse_depth_m', p.crevasseDepth],
      ['balance_mwe_a', p.balance],
    ];
    rows.forEach((row, i) => {
      expect(Number(row.t_yr)).toBe(0.3);
      expect(Number(row.x_m)).toBe(p.x[i]);
      for (const [name, values] of columns) {
        const v = values[i];
        if (Number.isFinite(v)) expect(Number(row[name]), `${name} row ${i}`).toBe(rounded(v, FIELD_DIGITS) + 0);
        else expect(row[name], `${name} row ${i}`).toBe('');
      }
    });
  });

  it('has one row per cell per output time, in time order, for a real run', () => {
    const scenario = cirque();
    const { report, outputs } = outputsOf(scenario);
    const rows = csvParse(outputs.profilesCsv);
    expect(rows.columns.join(',')).toBe(PROFILES_COLUMNS);
    const cells = report.model.grid.cellCount;
    expect(cells).toBe(30);
    expect(rows).toHaveLength(cells * 5);
    const times = rows.map((r) => Number(r.t_yr));
    expect([...new Set(times)]).toEqual([0, 15, 30, 45, 50]);
    // Each time block lists the cell centres in order.
    rows.forEach((r, k) => expect(Number(r.x_m)).toBe(50 + 100 * (k % cells)));
    // The final block is the final thickness, to the written precision.
    const last = report.frames[report.frames.length - 1].fields.thickness;
    rows.slice(-cells).forEach((r, i) => expect(Number(r.thickness_m)).toBe(rounded(last[i], FIELD_DIGITS) + 0));
  });

  it('writes nothing for an output time with no cells but the header stays', () => {
    const p = awkwardProfile();
    const empty = Object.fromEntries(Object.keys(p).map((k) => [k, new Float64Array(0)])) as unknown as ProfileFields;
    expect(profileRows(0, empty)).toBe('');
    expect(profilesCsv([{ time: 0, fields: empty }])).toBe(PROFILES_COLUMNS + '\n');
  });
});

describe('series.csv', () => {
  it('has the exact header and one row per output time, volume and area unrounded', () => {
    const scenario = cirque();
    const { report, outputs } = outputsOf(scenario);
    const text = outputs.seriesCsv;
    expect(text.split('\n')[0]).toBe(SERIES_COLUMNS);
    expect(text.endsWith('\n')).toBe(true);
    const rows = csvParse(text);
    expect(rows.map((r) => Number(r.t_yr))).toEqual([0, 15, 30, 45, 50]);
    rows.forEach((row, k) => {
      const frame = report.frames[k];
      const g = glacierNumbers(report.model, profileFields(report.model, frame.fields.thickness, frame.time), frame.time);
      expect(Number(row.volume_m3)).toBe(g.volume);
      expect(Number(row.area_m2)).toBe(g.area);
      expect(Number(row.length_m)).toBe(rounded(g.length, FIELD_DIGITS));
      expect(Number(row.terminus_m)).toBe(rounded(g.terminus, FIELD_DIGITS));
      expect(Number(row.ela_m)).toBe(rounded(g.ela, FIELD_DIGITS));
      expect(Number(row.aar)).toBe(rounded(g.aar, FIELD_DIGITS));
      expect(Number(row.max_thickness_m)).toBe(rounded(g.maxThickness, FIELD_DIGITS));
      expect(Number(row.max_u_surface_m_a)).toBe(rounded(g.maxSurfaceSpeed, FIELD_DIGITS));
      expect(Number(row.warming_K)).toBe(rounded(g.warming, FIELD_DIGITS) + 0);
      expect(Number(row.frontal_ablation_m3_a)).toBe(rounded(g.frontalAblation, FIELD_DIGITS) + 0);
    });
    // The last volume is the mass budget's final volume, to the last digit.
    expect(Number(rows[rows.length - 1].volume_m3)).toBe(report.summary.massBudget.finalVolume);
  });

  it('leaves terminus and AAR empty for an ice-free valley', () => {
    // ELA far above the bed: no ice forms, so there is no terminus and no accumulation-area ratio.
    const scenario = cirque((s) => {
      delete s.surface;
      s.massBalance = { model: 'linear', ela: 4000, ablationGradient: 0.007 };
    });
    const rows = csvParse(outputsOf(scenario).outputs.seriesCsv);
    expect(rows).toHaveLength(5);
    for (const row of rows) {
      expect(row.terminus_m).toBe('');
      expect(row.aar).toBe('');
      expect(row.volume_m3).toBe('0');
      expect(row.length_m).toBe('0');
    }
  });

  it('writes hand-made non-finite numbers as empty fields', () => {
    const g: GlacierNumbers = {
      time: 5,
      volume: Number.NaN,
      area: Number.POSITIVE_INFINITY,
      length: 0,
      terminus: Number.NaN,
      ela: Number.NEGATIVE_INFINITY,
      aar: Number.NaN,
      maxThickness: 0,
      maxSurfaceSpeed: 0,
      warming: -0,
      frontalAblation: 0,
    };
    expect(seriesCsv([g])).toBe(`${SERIES_COLUMNS}\n5,,,0,,,,0,0,0,0\n`);
  });
});
