import { buildSubmission, driverBody, emptyDraft, extraHarmonics, fileMeta, fileProblems, guessFileMeta, methodBody, readNumber, splShiftDb, type Draft, type DraftFile } from './draft';

const file = (over: Partial<DraftFile>): DraftFile => ({
  id: over.name ?? 'f',
  name: 'f.txt',
  size: 100,
  kind: 'spl',
  angle: '0',
  level: '',
  settings: { columns: '', xUnit: 'auto', distortionUnit: 'auto' },
  status: 'read',
  progress: 1,
  token: 'a'.repeat(32),
  warnings: [],
  ...over,
});

describe('guessFileMeta', () => {
  it.each([
    ['spl_30deg.txt', 'spl', '30', ''],
    ['mid3-spl-60deg.txt', 'spl', '60', ''],
    ['spl--30deg.txt', 'spl', '-30', ''],
    ['-45deg.txt', 'spl', '-45', ''],
    ['response -15 deg.csv', 'spl', '-15', ''],
    ['on-axis.txt', 'spl', '0', ''],
    ['impedance.txt', 'impedance', '', ''],
    ['thd-5.66V.csv', 'thd', '', '5.66'],
    ['THD 2,83 V.txt', 'thd', '', '2.83'],
    ['h3_11.3v.txt', 'h3', '', '11.3'],
    ['Bl(x).csv', 'bl_x', '', ''],
    ['kms_x.txt', 'kms_x', '', ''],
    ['Le(x).txt', 'le_x', '', ''],
    ['imd-4V.txt', 'imd', '', '4'],
  ])('%s → %s', (name, kind, angle, level) => {
    expect(guessFileMeta(name)).toEqual({ kind, angle, level });
  });
});

describe('fileMeta', () => {
  it('turns 1-based column numbers into the parser’s 0-based choice', () => {
    const m = fileMeta(file({ kind: 'impedance', angle: '', settings: { columns: '1, 3, 4', xUnit: 'kHz', distortionUnit: 'db' } }));
    expect(m).toEqual({ meta: { kind: 'impedance', angleDeg: null, driveLevelV: null, options: { columns: { x: 0, y: 2, phase: 3 }, xUnit: 'kHz' } } });
  });
  it('keeps the distortion unit only for distortion curves', () => {
    const m = fileMeta(file({ kind: 'thd', level: '2,83', settings: { columns: '', xUnit: 'auto', distortionUnit: 'db' } }));
    expect(m).toEqual({ meta: { kind: 'thd', angleDeg: null, driveLevelV: 2.83, options: { distortionUnit: 'db' } } });
  });
  it('names what is missing', () => {
    expect(fileMeta(file({ kind: 'thd', level: '' }))).toEqual({ error: 'give the drive level in volts' });
    expect(fileMeta(file({ kind: 'spl', angle: '200' }))).toEqual({ error: 'give the angle in degrees, −180 to 180' });
    expect(fileMeta(file({ settings: { columns: '0 1', xUnit: 'auto', distortionUnit: 'auto' } }))).toHaveProperty('error');
  });
});

describe('fileProblems', () => {
  it('flags two files claiming the same curve', () => {
    const p = fileProblems([file({ name: 'a.txt', angle: '30' }), file({ name: 'b.txt', angle: '30' })]);
    expect(p).toEqual(['b.txt and a.txt are both SPL at 30°']);
  });
  it('carries a broken file’s line-numbered message, naming the file once, and lets it claim no curve', () => {
    const p = fileProblems([
      file({ name: 'bad.txt', status: 'failed', error: { line: 212, message: '"bad.txt", line 212: non-numeric value "abc"' } }),
      file({ name: 'good.txt' }),
    ]);
    expect(p).toEqual(['"bad.txt", line 212: non-numeric value "abc"; remove it or fix the file']);
  });
});

describe('methodBody', () => {
  it('reads decimal commas and leaves optional fields null', () => {
    const r = methodBody({ ...emptyDraft().method, driveVoltage: '5,66', distance: '0.5', baffle: 'IEC baffle' });
    expect(r).toEqual({ ok: true, value: { driveVoltageV: 5.66, distanceM: 0.5, baffle: 'IEC baffle', gating: null, temperatureC: null, measuredOn: null, sampleId: null, burnIn: 'out-of-box' } });
  });
  it('names each bad field', () => {
    const r = methodBody({ ...emptyDraft().method, driveVoltage: 'x', distance: '', baffle: '' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems).toEqual(['Drive voltage: not a number', 'Distance: required']);
  });
  it('uses the shared schema for limits (distance over 20 m)', () => {
    const r = methodBody({ ...emptyDraft().method, distance: '25', baffle: 'b' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]).toMatch(/^Distance:/);
  });
});

describe('driverBody', () => {
  // Invented names; the limits come from the column table the server shares.
  const entry = (makerName: string, model: string) => ({ mode: 'new' as const, makerName, model, type: 'mid-range' as const, size: '3', impedance: '4' });

  it('takes names in any script', () => {
    expect(driverBody(entry('日本音響', 'NA-10'))).toMatchObject({ ok: true, value: { makerName: '日本音響', model: 'NA-10' } });
  });

  it('names a maker or model the server would refuse before it is sent', () => {
    expect(driverBody(entry('!!', '—'))).toEqual({ ok: false, problems: ['Maker: at least two characters, with a letter or digit', 'Model: required, with a letter or digit'] });
    expect(driverBody(entry('M'.repeat(201), 'X'.repeat(201)))).toEqual({ ok: false, problems: ['Maker: at most 200 characters', 'Model: at most 200 characters'] });
  });
});

describe('buildSubmission', () => {
  const draft: Draft = {
    driver: { mode: 'new', makerName: 'Invented Works', model: 'IW-3', type: 'mid-range', size: '3', impedance: '4' },
    method: { ...emptyDraft().method, baffle: 'test baffle' },
    files: [file({ name: 'a.txt', token: 'b'.repeat(32) })],
  };
  it('builds the body the server schema accepts, small and large parameters apart', () => {
    const r = buildSubmission(draft, { fs: 90, qts: undefined }, { x_bl: 0.002 });
    expect(r).toEqual({
      ok: true,
      body: {
        driver: { makerName: 'Invented Works', model: 'IW-3', type: 'mid-range', nominalSizeIn: 3, nominalImpedanceOhm: 4 },
        method: expect.objectContaining({ driveVoltageV: 2.83, distanceM: 1, baffle: 'test baffle' }),
        uploads: ['b'.repeat(32)],
        parameters: [{ name: 'fs', value: 90, signal: 'small' }, { name: 'x_bl', value: 0.002, signal: 'large' }],
      },
    });
  });
  it('refuses while a file is unread', () => {
    const r = buildSubmission({ ...draft, files: [file({ status: 'reading', name: 'slow.txt' })] }, {}, {});
    expect(r).toEqual({ ok: false, problems: ['slow.txt: still being read'] });
  });
});

it('readNumber takes a decimal comma and rejects words', () => {
  expect(readNumber(' 2,83 ')).toBe(2.83);
  expect(readNumber('abc')).toBeUndefined();
  expect(readNumber('')).toBeUndefined();
});

it('refers 5.66 V at 0.5 m to 2.83 V / 1 m by −12.04 dB', () => {
  // 20·log10(2.83/5.66) = −6.02 dB (voltage ratio) and 20·log10(0.5/1) = −6.02 dB (inverse-distance
  // law): handbook relations, e.g. Davis & Patronis, Sound System Engineering, ch. 2 (from memory).
  expect(splShiftDb(5.66, 0.5)).toBeCloseTo(-12.041, 3);
});

describe('extraHarmonics', () => {
  const table = file({ id: 't', kind: 'thd', level: '5.66', angle: '', header: 'Freq [Hz]\tFund [dB]\tTHD [%]\tH2 [%]\tH3 [%]' });
  it('offers the H2 and H3 columns a THD table names', () => {
    expect(extraHarmonics(table, [table])).toEqual(['h2', 'h3']);
  });
  it('offers only what is not yet taken at that level, and nothing for a two-column file', () => {
    const h2 = file({ id: 'u', kind: 'h2', level: '5,66', angle: '' });
    expect(extraHarmonics(table, [table, h2])).toEqual(['h3']);
    const plain = { ...table, header: 'Frequency [Hz],THD [%]' };
    expect(extraHarmonics(plain, [plain])).toEqual([]);
  });
});
