import type { Curve, MeasurementSet } from '../../../shared/schemas/drivers';
import {
  distortionSeries, excursionDomain, splDomain, impedancePhaseSeries, impedanceSeries, largeSignalSeries, phaseDomain, setOverlaySeries, seriesStyle, splSeries,
} from './driver-series';

const curve = (kind: Curve['kind'], extra: Partial<Curve> = {}): Curve => ({ kind, angleDeg: null, driveLevelV: null, x: [100, 1000], y: [1, 2], phase: null, ...extra });

const set = (id: number, curves: Curve[]): MeasurementSet => ({
  id, label: `Set ${id}`, reviewer: 'Bench A', sampleId: null, burnIn: 'burned-in', driveVoltageV: 2.83, distanceM: 1, baffle: 'IEC baffle', gating: null,
  temperatureC: null, measuredOn: null, anglesDeg: [], parameters: [], curves,
});

const palette = ['#a', '#b', '#c', '#d'];

describe('driver chart series', () => {
  it('gives each series a distinct colour and dash pair', () => {
    const pairs = new Set(Array.from({ length: 12 }, (_, i) => JSON.stringify(seriesStyle(i, palette))));
    expect(pairs.size).toBe(12);
  });

  it('orders SPL by angle with on-axis first and labelled', () => {
    const s = splSeries(set(1, [curve('spl', { angleDeg: 30 }), curve('spl', { angleDeg: 0 }), curve('spl', { angleDeg: 15 }), curve('impedance')]), palette);
    expect(s.map((x) => x.label)).toEqual(['On axis', '15°', '30°']);
    expect(s[0].dash).toBeUndefined();
    expect(s[1].dash).toBeDefined();
  });

  it('overlays every set by its on-axis curve', () => {
    const s = setOverlaySeries([set(1, [curve('spl', { angleDeg: 30 }), curve('spl', { angleDeg: 0, y: [5, 6] })]), set(2, [curve('impedance')])], palette);
    expect(s).toHaveLength(1);
    expect(s[0]).toMatchObject({ id: 'set-1', label: 'Set 1', y: [5, 6] });
  });

  it('pairs measured and fitted impedance', () => {
    expect(impedanceSeries(set(1, [curve('impedance_fit'), curve('impedance')]), palette).map((s) => s.label)).toEqual(['Measured', 'Fitted model']);
  });

  it('draws measured phase solid and fitted phase dashed, in the magnitude chart\'s colours', () => {
    const m = set(1, [curve('impedance_fit', { phase: [10, -5] }), curve('impedance', { phase: [12, -4] })]);
    const p = impedancePhaseSeries(m, palette);
    expect(p.map((s) => [s.id, s.label, s.y])).toEqual([['phase-measured', 'Measured', [12, -4]], ['phase-fit', 'Fitted model', [10, -5]]]);
    expect(p[0].x).toEqual([100, 1000]);
    expect(p[0].dash).toBeUndefined();
    expect(p[1].dash).toEqual([8, 4]);
    const z = impedanceSeries(m, palette);
    expect(p.map((s) => [s.color, s.dash, s.width])).toEqual(z.map((s) => [s.color, s.dash, s.width]));
  });

  it('gives no phase series for curves without phase, or no set', () => {
    expect(impedancePhaseSeries(set(1, [curve('impedance'), curve('impedance_fit', { phase: [] }), curve('spl', { phase: [1, 2] })]), palette)).toEqual([]);
    expect(impedancePhaseSeries(undefined, palette)).toEqual([]);
  });

  it('keeps only the points that have both a frequency and a phase', () => {
    const [p] = impedancePhaseSeries(set(1, [curve('impedance', { x: [10, 20, 40], phase: [30, 0] })]), palette);
    expect(p.x).toEqual([10, 20]);
    expect(p.y).toEqual([30, 0]);
  });

  it('adds harmonics only when asked, coloured by drive level', () => {
    const m = set(1, [curve('thd', { driveLevelV: 10 }), curve('thd', { driveLevelV: 2.83 }), curve('h2', { driveLevelV: 2.83 }), curve('h3', { driveLevelV: 2.83 })]);
    expect(distortionSeries(m, { h2: false, h3: false }, palette).map((s) => s.label)).toEqual(['THD 2.83 V', 'THD 10 V']);
    const all = distortionSeries(m, { h2: true, h3: true }, palette);
    expect(all.map((s) => s.label)).toEqual(['THD 2.83 V', 'THD 10 V', 'H2 2.83 V', 'H3 2.83 V']);
    expect(all[2].color).toBe(all[0].color);
  });

  it('puts large-signal curves in mm and percent of the value at rest', () => {
    const m = set(1, [curve('bl_x', { x: [-0.002, 0, 0.002], y: [3, 4, 2] })]);
    const [bl] = largeSignalSeries(m, palette);
    expect(bl.x).toEqual([-2, 0, 2]);
    expect(bl.y).toEqual([75, 100, 50]);
    expect(excursionDomain([bl])).toEqual([-2, 2]);
  });
});

describe('splDomain', () => {
  it('follows the on-axis peak with 5 dB headroom and a 50 dB span', () => {
    // Peak 91.2 dB + 5 = 96.2, snapped up to 100; 50 dB below is 50.
    expect(splDomain([{ id: 'a', x: [1, 2], y: [80, 91.2], color: '' }, { id: 'b', x: [1], y: [-40], color: '' }])).toEqual([50, 100]);
    expect(splDomain([])).toBeUndefined();
  });
});

describe('phaseDomain', () => {
  it('spans −90..90 degrees and widens in 30° steps up to ±180', () => {
    // A passive load's impedance phase lies within ±90° (common practice, no source).
    expect(phaseDomain([])).toEqual([-90, 90]);
    expect(phaseDomain([{ id: 'a', x: [1, 2, 3], y: [-45, 60, NaN], color: '' }])).toEqual([-90, 90]);
    expect(phaseDomain([{ id: 'a', x: [1, 2], y: [-95, 100], color: '' }])).toEqual([-120, 120]);
    expect(phaseDomain([{ id: 'a', x: [1], y: [-400], color: '' }])).toEqual([-180, 90]);
  });
});
