// The submission being prepared, as pure data: what each step holds, what is still wrong with it,
// and the request body it becomes. The screens only render this and dispatch changes.
import { normaliseSpl } from '../../../shared/acoustics/levels';
import { readTypedNumber } from '../../../shared/input/typed-number';
import { DISTORTION_KINDS } from '../../../shared/uploads';
import { columnLimits } from '../../../shared/schemas/column-limits';
import { driverTypes, type BurnInState, type DriverType } from '../../../shared/schemas/drivers';
import { methodSchema, submissionSchema, type SubmissionInput, type UploadMeta } from '../../../shared/schemas/submissions';

export type UploadKind = UploadMeta[number]['kind'];

export const UPLOAD_KINDS: readonly { value: UploadKind; label: string; needs: 'angle' | 'level' | null }[] = [
  { value: 'spl', label: 'SPL', needs: 'angle' },
  { value: 'impedance', label: 'Impedance', needs: null },
  { value: 'thd', label: 'THD', needs: 'level' },
  { value: 'h2', label: 'H2', needs: 'level' },
  { value: 'h3', label: 'H3', needs: 'level' },
  { value: 'imd', label: 'IMD', needs: 'level' },
  { value: 'bl_x', label: 'Bl(x)', needs: null },
  { value: 'kms_x', label: 'Kms(x)', needs: null },
  { value: 'le_x', label: 'Le(x)', needs: null },
];

export const kindNeeds = (kind: UploadKind) => UPLOAD_KINDS.find((k) => k.value === kind)?.needs ?? null;

export interface FileSettings {
  /** 1-based column numbers as typed, e.g. "1, 3" or "1 2 3"; empty lets the header decide. */
  columns: string;
  xUnit: 'auto' | 'Hz' | 'kHz' | 'mm' | 'm';
  distortionUnit: 'auto' | 'percent' | 'db';
}

export interface ParsedPreview {
  x: number[];
  y: number[];
  phase: number[] | null;
}

export interface DraftFile {
  id: string;
  name: string;
  size: number;
  kind: UploadKind;
  /** As typed, so a half-typed "-3" stays on screen. */
  angle: string;
  level: string;
  settings: FileSettings;
  status: 'reading' | 'read' | 'failed';
  /** 0..1 of the bytes sent. */
  progress: number;
  token?: string;
  /** The server's preview: acoustic curves on the common grid, others thinned; not every point read. */
  points?: ParsedPreview;
  summary?: string;
  warnings: string[];
  error?: { line: number | null; message: string };
  /** Set on a second reading of another file (its H2 or H3 columns): that file's id. */
  copyOf?: string;
  /** The column titles line the server found, if any, e.g. to offer the other columns of a table. */
  header?: string | null;
  /** The meta the current result was read with; a change means the file must be read again. */
  readWith?: string;
}

export type DriverChoice =
  | { mode: 'existing'; slug: string; label: string }
  | { mode: 'new'; makerName: string; model: string; type: DriverType; size: string; impedance: string };

export interface MethodText {
  driveVoltage: string;
  distance: string;
  baffle: string;
  gating: string;
  temperature: string;
  measuredOn: string;
  sampleId: string;
  burnIn: BurnInState;
}

export interface Draft {
  driver: DriverChoice;
  method: MethodText;
  files: DraftFile[];
}

export const emptyDraft = (): Draft => ({
  driver: { mode: 'new', makerName: '', model: '', type: 'mid-range', size: '', impedance: '' },
  method: { driveVoltage: '2.83', distance: '1', baffle: '', gating: '', temperature: '', measuredOn: '', sampleId: '', burnIn: 'out-of-box' },
  files: [],
});

/** Reads a number typed with a point or a comma; undefined for empty or not a number. */
export function readNumber(text: string): number | undefined {
  return readTypedNumber(text).value;
}

/**
 * "spl-30deg" is 30° with a dash between words; "spl -30deg" and "spl--30deg" are −30°: a minus
 * counts as a sign only when it does not join two words.
 */
function angleFromName(n: string): string {
  const m = /(\d{1,3})\s*(?:deg|°|d(?![a-z]))/.exec(n);
  if (!m) return '0';
  const before = n[m.index - 1];
  const twoBefore = m.index >= 2 ? n[m.index - 2] : '';
  const negative = before === '-' && (m.index === 1 || /[\s(-]/.test(twoBefore));
  return negative ? `-${m[1]}` : m[1];
}

/**
 * Guesses a file's kind, angle and drive level from its name ("spl_30deg.txt", "thd-5.66V.csv",
 * "imp.txt", "Bl(x).csv"), so a folder of exports needs few corrections. Only a guess: every value
 * stays editable.
 */
export function guessFileMeta(fileName: string): { kind: UploadKind; angle: string; level: string } {
  // Underscores separate words in file names, so they count as boundaries here.
  const n = fileName.toLowerCase().replace(/\.[a-z0-9]+$/, '').replace(/_/g, ' ');
  let kind: UploadKind = 'spl';
  if (/\bbl\s*\(?x\)?|bl[_-]?x|bl[_ -]?excursion/.test(n)) kind = 'bl_x';
  else if (/kms\s*\(?x\)?|kms[_-]?x|cms\s*\(?x\)?|cms[_-]?x/.test(n)) kind = 'kms_x';
  else if (/\ble\s*\(x\)|\ble[_-]x\b|le[_ -]?excursion/.test(n)) kind = 'le_x';
  else if (/imd|intermod/.test(n)) kind = 'imd';
  else if (/thd/.test(n)) kind = 'thd';
  else if (/\bh(d)?2\b|2nd|second/.test(n)) kind = 'h2';
  else if (/\bh(d)?3\b|3rd|third/.test(n)) kind = 'h3';
  else if (/imp|\bz\b|ohm/.test(n)) kind = 'impedance';
  const needs = kindNeeds(kind);
  const angle = needs === 'angle' ? angleFromName(n) : '';
  const level = needs === 'level' ? (/(\d+(?:[.,]\d+)?)\s*v(rms)?\b/.exec(n)?.[1]?.replace(',', '.') ?? '') : '';
  return { kind, angle, level };
}

/** What the server is told about a file; a change to it means reading the file again. */
export function fileMeta(f: Pick<DraftFile, 'kind' | 'angle' | 'level' | 'settings'>): { meta: UploadMeta[number] } | { error: string } {
  const needs = kindNeeds(f.kind);
  const angle = readNumber(f.angle);
  const level = readNumber(f.level);
  if (needs === 'angle' && (angle === undefined || angle < -180 || angle > 180)) return { error: 'give the angle in degrees, −180 to 180' };
  if (needs === 'level' && (level === undefined || level <= 0)) return { error: 'give the drive level in volts' };
  const options: NonNullable<UploadMeta[number]['options']> = {};
  const cols = f.settings.columns.trim();
  if (cols) {
    const nums = cols.split(/[\s,;]+/).filter(Boolean).map(Number);
    if (nums.length < 2 || nums.length > 3 || nums.some((c) => !Number.isInteger(c) || c < 1)) return { error: 'columns: two or three column numbers, counting from 1' };
    options.columns = { x: nums[0] - 1, y: nums[1] - 1, ...(nums[2] ? { phase: nums[2] - 1 } : {}) };
  }
  if (f.settings.xUnit !== 'auto') options.xUnit = f.settings.xUnit;
  if (f.settings.distortionUnit !== 'auto' && DISTORTION_KINDS.includes(f.kind)) options.distortionUnit = f.settings.distortionUnit;
  return {
    meta: {
      kind: f.kind,
      angleDeg: needs === 'angle' ? (angle as number) : null,
      driveLevelV: needs === 'level' ? (level as number) : null,
      ...(Object.keys(options).length ? { options } : {}),
    },
  };
}

function zodMessages(issues: readonly { path: readonly PropertyKey[]; message: string }[], names: Record<string, string>): string[] {
  return issues.map((i) => `${names[String(i.path[0])] ?? String(i.path[0] ?? 'method')}: ${i.message}`);
}

const methodNames: Record<string, string> = {
  driveVoltageV: 'Drive voltage', distanceM: 'Distance', baffle: 'Baffle or enclosure', gating: 'Gating', temperatureC: 'Temperature',
  measuredOn: 'Date', sampleId: 'Sample id', burnIn: 'Burn-in',
};

/** The method as the server's schema reads it, or the problems that stop it. */
export function methodBody(m: MethodText): { ok: true; value: SubmissionInput['method'] } | { ok: false; problems: string[] } {
  const problems: string[] = [];
  const num = (text: string, label: string, required: boolean) => {
    const v = readNumber(text);
    if (text.trim() !== '' && v === undefined) problems.push(`${label}: not a number`);
    if (required && text.trim() === '') problems.push(`${label}: required`);
    return v;
  };
  const body = {
    driveVoltageV: num(m.driveVoltage, 'Drive voltage', true),
    distanceM: num(m.distance, 'Distance', true),
    baffle: m.baffle,
    gating: m.gating.trim() || null,
    temperatureC: num(m.temperature, 'Temperature', false) ?? null,
    measuredOn: m.measuredOn.trim() || null,
    sampleId: m.sampleId.trim() || null,
    burnIn: m.burnIn,
  };
  if (problems.length) return { ok: false, problems };
  const parsed = methodSchema.safeParse(body);
  if (!parsed.success) return { ok: false, problems: zodMessages(parsed.error.issues, methodNames) };
  return { ok: true, value: body as SubmissionInput['method'] };
}

export function driverBody(d: DriverChoice): { ok: true; value: SubmissionInput['driver'] } | { ok: false; problems: string[] } {
  if (d.mode === 'existing') return d.slug ? { ok: true, value: { slug: d.slug } } : { ok: false, problems: ['Pick a driver from the catalogue'] };
  const problems: string[] = [];
  // The server makes the address from these names, so each needs a letter or digit in some script.
  const named = (s: string) => /[\p{L}\p{N}]/u.test(s);
  const maker = d.makerName.trim();
  const model = d.model.trim();
  if (maker.length < 2 || !named(maker)) problems.push('Maker: at least two characters, with a letter or digit');
  else if (maker.length > columnLimits.makers.name) problems.push(`Maker: at most ${columnLimits.makers.name} characters`);
  if (!model || !named(model)) problems.push('Model: required, with a letter or digit');
  else if (model.length > columnLimits.drivers.model) problems.push(`Model: at most ${columnLimits.drivers.model} characters`);
  if (!driverTypes.includes(d.type)) problems.push('Type: pick one');
  const size = readNumber(d.size);
  const impedance = readNumber(d.impedance);
  if (!(size !== undefined && size > 0 && size <= 30)) problems.push('Nominal size: inches, above 0 and up to 30');
  if (!(impedance !== undefined && impedance > 0 && impedance <= 100)) problems.push('Nominal impedance: ohms, above 0 and up to 100');
  if (problems.length) return { ok: false, problems };
  return { ok: true, value: { makerName: d.makerName.trim(), model: d.model.trim(), type: d.type, nominalSizeIn: size as number, nominalImpedanceOhm: impedance as number } };
}

/**
 * Harmonic curves a THD file's header names but the draft does not take yet, so one table of
 * fundamental, THD, H2 and H3 can give all three curves.
 */
export function extraHarmonics(file: DraftFile, all: readonly DraftFile[]): ('h2' | 'h3')[] {
  if (file.kind !== 'thd' || file.status !== 'read' || !file.header) return [];
  const h = file.header.toLowerCase();
  const named = { h2: /\b(h2|hd2|k2|2nd)\b/.test(h), h3: /\b(h3|hd3|k3|3rd)\b/.test(h) };
  const taken = (k: 'h2' | 'h3') => all.some((f) => f.kind === k && readNumber(f.level) === readNumber(file.level));
  return (['h2', 'h3'] as const).filter((k) => named[k] && !taken(k));
}

export function fileProblems(files: readonly DraftFile[]): string[] {
  const out: string[] = [];
  if (files.length === 0) out.push('Add at least one curve file');
  for (const f of files) {
    if (f.status === 'reading') out.push(`${f.name}: still being read`);
    else if (f.status === 'failed') {
      const message = f.error?.message ?? 'could not be read';
      out.push(`${message.includes(f.name) ? message : `${f.name}: ${message}`}; remove it or fix the file`);
    }
  }
  const seen = new Map<string, string>();
  // A file that failed to read is reported above; it claims no curve.
  for (const f of files.filter((x) => x.status !== 'failed')) {
    const m = fileMeta(f);
    if ('error' in m) {
      out.push(`${f.name}: ${m.error}`);
      continue;
    }
    const key = `${m.meta.kind}|${m.meta.angleDeg}|${m.meta.driveLevelV}`;
    const other = seen.get(key);
    if (other) out.push(`${f.name} and ${other} are both ${UPLOAD_KINDS.find((k) => k.value === f.kind)?.label}${m.meta.angleDeg !== null ? ` at ${m.meta.angleDeg}°` : ''}${m.meta.driveLevelV !== null ? ` at ${m.meta.driveLevelV} V` : ''}`);
    else seen.set(key, f.name);
  }
  return out;
}

export type ParameterValues = Partial<Record<string, number>>;

/** The request body, checked by the same schema the server uses. */
export function buildSubmission(draft: Draft, small: ParameterValues, large: ParameterValues): { ok: true; body: SubmissionInput } | { ok: false; problems: string[] } {
  const driver = driverBody(draft.driver);
  const method = methodBody(draft.method);
  const problems = [...(driver.ok ? [] : driver.problems), ...(method.ok ? [] : method.problems), ...fileProblems(draft.files)];
  if (!driver.ok || !method.ok || problems.length) return { ok: false, problems };
  const parameters = [
    ...Object.entries(small).filter(([, v]) => v !== undefined).map(([name, value]) => ({ name, value: value as number, signal: 'small' as const })),
    ...Object.entries(large).filter(([, v]) => v !== undefined).map(([name, value]) => ({ name, value: value as number, signal: 'large' as const })),
  ];
  const body: SubmissionInput = { driver: driver.value, method: method.value, uploads: draft.files.map((f) => f.token as string), parameters };
  const checked = submissionSchema.safeParse(body);
  if (!checked.success) return { ok: false, problems: checked.error.issues.map((i) => `${i.path.join('.') || 'submission'}: ${i.message}`) };
  return { ok: true, body };
}

/** SPL shift applied on the server to refer a response to 2.83 V / 1 m, for the preview's label. */
export function splShiftDb(driveVoltageV: number, distanceM: number): number {
  return normaliseSpl(0, { drive: { voltage: driveVoltageV }, distance: distanceM });
}
