import request from 'supertest';
import { createApp } from '../../server/app';
import { errorEnvelopeSchema } from '../../shared/api/errors';
import { createTestDb } from '../support/test-db';

// Speed of sound at 20 °C, c = 343.2·√(T/293.15 K): ISO 9613-1:1993.
const C20 = 343.2;

function fieldsOf(body: unknown): { field: string; message: string }[] {
  const env = errorEnvelopeSchema.parse(body);
  expect(env.error.code).toBe('validation_failed');
  return (env.error.details as { fields: { field: string; message: string }[] }).fields;
}

describe('calculator API', () => {
  const db = createTestDb();
  const app = createApp({ db });
  const post = (name: string, body: unknown) => request(app).post(`/api/calc/${name}`).send(body as object);
  afterAll(() => db.destroy());

  describe('answers each route', () => {
    it('closed-box from a box volume', async () => {
      const res = await post('closed-box', { fs: 30, qts: 0.35, vas: 0.05, vb: 0.025 });
      expect(res.status).toBe(200);
      // Small, JAES 1972: alpha = Vas/Vb, fc = fs·√(1+alpha), Qtc = Qts·√(1+alpha).
      expect(res.body.alpha).toBeCloseTo(2, 10);
      expect(res.body.fc).toBeCloseTo(30 * Math.sqrt(3), 8);
      expect(res.body.qtc).toBeCloseTo(0.35 * Math.sqrt(3), 8);
    });

    it('closed-box from a target Qtc', async () => {
      const res = await post('closed-box', { fs: 30, qts: 0.35, vas: 0.05, qtc: 0.707 });
      expect(res.status).toBe(200);
      // Small, JAES 1972, solved for the box: Vb = Vas/((Qtc/Qts)² − 1).
      expect(res.body.vb).toBeCloseTo(0.05 / ((0.707 / 0.35) ** 2 - 1), 10);
      // Small, JAES 1972: (f3/fc)² = [(1/Qtc² − 2) + √((1/Qtc² − 2)² + 4)]/2, which is 1 for Qtc = 1/√2.
      expect(res.body.f3 / res.body.fc).toBeCloseTo(1, 2);
    });

    it('vented-box B4', async () => {
      const res = await post('vented-box', { fs: 30, qts: 0.383, vas: 0.05, alignment: 'B4' });
      expect(res.status).toBe(200);
      // Thiele 1971, lossless B4 table row: Qts = 0.383, alpha = √2, fb = fs, f3 = fs (value from memory).
      expect(res.body.alpha).toBeCloseTo(Math.SQRT2, 3);
      expect(res.body.vb).toBeCloseTo(0.05 / Math.SQRT2, 4);
      expect(res.body.fb).toBeCloseTo(30, 6);
      expect(res.body.f3).toBeCloseTo(30, 1);
    });

    it('vented-box QB3', async () => {
      const qt = 0.3;
      const res = await post('vented-box', { fs: 30, qts: qt, vas: 0.05, alignment: 'QB3' });
      expect(res.status).toBe(200);
      // QB3 condition a1² = 2·a2 on Small's vented-box coefficients (JAES 1973) with QL = ∞ solved by hand:
      // h = 1/√(8·Qt²·(1 − Qt²)).
      expect(res.body.h).toBeCloseTo(1 / Math.sqrt(8 * qt * qt * (1 - qt * qt)), 4);
      expect(res.body.fb).toBeCloseTo(30 * res.body.h, 8);
    });

    it('thiele-small completes the set with efficiency and sensitivity', async () => {
      const input = { fs: 40, qms: 4, qes: 0.4, vas: 0.05, re: 6, sd: 0.0133, xmax: 0.005, temperatureC: 20 };
      const res = await post('thiele-small', input);
      expect(res.status).toBe(200);
      // Thiele 1971: Qts = Qms·Qes/(Qms + Qes).
      expect(res.body.qts).toBeCloseTo((4 * 0.4) / 4.4, 10);
      // Small, JAES 1972: eta0 = 4π²·fs³·Vas/(c³·Qes).
      const eta0 = (4 * Math.PI ** 2 * 40 ** 3 * 0.05) / (C20 ** 3 * 0.4);
      expect(res.body.eta0).toBeCloseTo(eta0, 8);
      // Small, JAES 1972: SPL(1 W, 1 m, half space) = 10·log10(ρ·c·eta0/(2π)/p_ref²), with
      // ρ = 1.2041 kg/m³ at 20 °C (ISO 2533) and p_ref = 20 µPa (IEC 60268-5); ≈ 112.1 + 10·log10(eta0).
      expect(res.body.spl1w).toBeCloseTo(10 * Math.log10((1.2041 * C20 * eta0) / (2 * Math.PI) / 20e-6 ** 2), 3);
      expect(Math.abs(res.body.spl1w - (112.1 + 10 * Math.log10(eta0)))).toBeLessThan(0.1);
      // 2.83 V into Re is 2.83²/Re watts (definition of the 2.83 V drive, common practice, no source).
      expect(res.body.spl283v - res.body.spl1w).toBeCloseTo(10 * Math.log10(2.83 ** 2 / 6), 8);
      // EBP = fs/Qes and Vd = Sd·Xmax: common practice, no source.
      expect(res.body.ebp).toBeCloseTo(100, 10);
      expect(res.body.vd).toBeCloseTo(0.0133 * 0.005, 12);
      expect(res.body.provenance.qts).toMatchObject({ source: 'derived' });
      expect(res.body.air.c).toBeCloseTo(C20, 6);
    });

    it('thiele-small reports inconsistent inputs', async () => {
      // Thiele 1971: Qts = Qms·Qes/(Qms + Qes) is 0.364 here, so 0.5 disagrees by far more than 2 %.
      const res = await post('thiele-small', { qms: 4, qes: 0.4, qts: 0.5 });
      expect(res.status).toBe(200);
      expect(res.body.warnings.length).toBeGreaterThan(0);
      expect(res.body.warnings[0].fields).toContain('qts');
    });

    it('impedance-model peaks at Re·(1 + Qms/Qes) at fs', async () => {
      const res = await post('impedance-model', { re: 6, fs: 40, qms: 4, qes: 0.4, frequencies: [20, 40, 80] });
      expect(res.status).toBe(200);
      // Small, JAES 1972: at resonance the motional branch is Res = Re·Qms/Qes, purely resistive.
      expect(res.body.magnitude[1]).toBeCloseTo(6 * (1 + 4 / 0.4), 8);
      expect(res.body.phaseDeg[1]).toBeCloseTo(0, 6);
    });

    it('impedance-fit recovers the parameters of a curve built from the textbook form', async () => {
      // Small, JAES 1972 (Le = 0): Z = Re + Res/(1 + j·Qms·(f/fs − fs/f)), Res = Re·Qms/Qes.
      const re = 6, fs = 40, qms = 4, qes = 0.4, res0 = (re * qms) / qes;
      const frequencies = Array.from({ length: 61 }, (_, i) => 10 * 2 ** (i / 12));
      const magnitude = frequencies.map((f) => {
        const x = qms * (f / fs - fs / f);
        const d = 1 + x * x;
        return Math.hypot(re + res0 / d, (-res0 * x) / d);
      });
      const res = await post('impedance-fit', { frequencies, magnitude });
      expect(res.status).toBe(200);
      expect(res.body.params.fs).toBeCloseTo(fs, 1);
      expect(res.body.params.qms / qms).toBeCloseTo(1, 2);
      expect(res.body.params.qes / qes).toBeCloseTo(1, 2);
    });

    it('excursion finds where Bl falls to 82 %', async () => {
      const res = await post('excursion', { x: [-0.01, -0.005, 0, 0.005, 0.01], bl: [4, 7, 8, 7, 4] });
      expect(res.status).toBe(200);
      // Threshold Bl(x)/Bl(0) = 0.82: "Assessment of voice-coil peak displacement Xmax", JAES 51(5), 2003.
      // Linear between the 7 T·m at 5 mm and 4 T·m at 10 mm points, 6.56 T·m is reached at 5 + 0.44/3·5 mm.
      expect(res.body.xBl).toBeCloseTo(0.005 + (0.44 / 3) * 0.005, 8);
      expect(res.body.governedBy).toBe('bl');
    });

    it('piston gives the ka = 1 and half-wavelength frequencies', async () => {
      const res = await post('piston', { diameter: 0.1, temperatureC: 20 });
      expect(res.status).toBe(200);
      // ka = 1 → f = c/(π·D); half wavelength across the cone → f = c/(2·D): common practice, no source.
      expect(res.body.ka1Hz).toBeCloseTo(C20 / (Math.PI * 0.1), 6);
      expect(res.body.halfWaveHz).toBeCloseTo(C20 / 0.2, 6);
    });

    it('levels converts THD, voltage ratios, distance and drive', async () => {
      // THD 1 % = 20·log10(0.01) = −40 dB: common practice, no source.
      expect((await post('levels', { conversion: 'thd-to-db', percent: 1 })).body.db).toBeCloseTo(-40, 10);
      expect((await post('levels', { conversion: 'db-to-thd', db: -20 })).body.percent).toBeCloseTo(10, 10);
      // A voltage ratio of 2 is 20·log10(2) = 6.02 dB: common practice, no source.
      expect((await post('levels', { conversion: 'voltage-ratio', voltage: 2, referenceVoltage: 1 })).body.db).toBeCloseTo(6.0206, 4);
      // Inverse distance law, −6.02 dB per doubling of distance: common practice, no source.
      expect((await post('levels', { conversion: 'distance', spl: 80, distance: 2 })).body.spl).toBeCloseTo(80 + 20 * Math.log10(2), 8);
      // 1 W into 4 Ω is 2 V (V = √(P·R)); referring it to 2.83 V adds 20·log10(2.83/2) dB: common practice, no source.
      const res = await post('levels', { conversion: 'normalise-spl', spl: 90, distance: 1, power: 1, impedance: 4 });
      expect(res.status).toBe(200);
      expect(res.body.spl).toBeCloseTo(90 + 20 * Math.log10(2.83 / 2), 8);
    });

    it('smooth takes the mean over the 1/N-octave window', async () => {
      // Worked by hand: a triangle of height 6 dB per octave either side of 200 Hz, averaged over
      // 200·2^(±1/2), has the mean 6 − 6·¼ = 4.5 dB.
      const res = await post('smooth', { frequencies: [100, 200, 400, 800], values: [0, 6, 0, 6], fraction: 1 });
      expect(res.status).toBe(200);
      expect(res.body.values[1]).toBeCloseTo(4.5, 8);
    });
  });

  describe('rejects bad input naming the field', () => {
    it('a missing field', async () => {
      const res = await post('closed-box', { qts: 0.35, vas: 0.05, vb: 0.02 });
      expect(res.status).toBe(400);
      expect(fieldsOf(res.body).map((f) => f.field)).toEqual(['fs']);
    });

    it('a negative value', async () => {
      const res = await post('piston', { diameter: -0.1 });
      expect(res.status).toBe(400);
      expect(fieldsOf(res.body)).toEqual([{ field: 'diameter', message: 'diameter must be positive' }]);
    });

    it('an unknown key', async () => {
      const res = await post('thiele-small', { fs: 40, colour: 'red' });
      expect(res.status).toBe(400);
      // zod reports unknown keys on the object itself, so the key is named in the message.
      expect(fieldsOf(res.body).map((f) => f.message).join(' ')).toMatch(/colour/);
    });

    it('arrays of different lengths', async () => {
      const res = await post('smooth', { frequencies: [100, 200, 400], values: [1, 2], fraction: 3 });
      expect(res.status).toBe(400);
      expect(fieldsOf(res.body).map((f) => f.field)).toEqual(['values']);
    });

    it('a target Qtc below the driver Qts', async () => {
      // Small, JAES 1972: Qtc = Qts·√(1+alpha) ≥ Qts, so a lower target needs a negative volume.
      const res = await post('closed-box', { fs: 30, qts: 0.5, vas: 0.05, qtc: 0.4 });
      expect(res.status).toBe(400);
      expect(fieldsOf(res.body).map((f) => f.field)).toEqual(['qtc']);
    });

    it('a B4 alignment for a driver whose Qts is far from 0.383', async () => {
      // Thiele 1971: the lossless B4 alignment needs Qts = 0.383 (value from memory).
      const res = await post('vented-box', { fs: 30, qts: 0.5, vas: 0.05, alignment: 'B4' });
      expect(res.status).toBe(400);
      const fields = fieldsOf(res.body);
      expect(fields.map((f) => f.field)).toEqual(['qts']);
      expect(fields[0].message).toMatch(/0\.383/);
    });

    it('a missing body', async () => {
      const res = await request(app).post('/api/calc/piston');
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('validation_failed');
    });
  });

  it('answers 404 in the envelope for an unknown calculator', async () => {
    const res = await post('no-such-calc', { fs: 40 });
    expect(res.status).toBe(404);
    expect(errorEnvelopeSchema.parse(res.body).error).toMatchObject({ code: 'not_found' });
  });
});
