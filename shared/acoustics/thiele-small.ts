/**
 * Thiele/Small small-signal parameter relations.
 *
 * Sources: Thiele, "Loudspeakers in vented boxes" (JAES 1971); Small, "Direct-radiator loudspeaker
 * system analysis" (JAES 1972) for η0 = 4π²·fs³·Vas/(c³·Qes) and the 1 W / 1 m sensitivity;
 * Beranek & Mellow, "Acoustics: Sound Fields and Transducers" (2012) for the air load of a baffled
 * piston, 8ρa³/3 per side at low frequency.
 */
import { airProperties, DRIVE_2V83, P_REF, type AirProperties } from './constants';

export const thieleSmallKeys = [
  'fs', 'qms', 'qes', 'qts', 're', 'le', 'mms', 'mmd', 'cms', 'kms', 'rms', 'bl', 'sd', 'diameter', 'vas', 'xmax',
] as const;
export type ThieleSmallKey = (typeof thieleSmallKeys)[number];

export const thieleSmallDerivedKeys = ['eta0', 'spl1w', 'spl283v', 'ebp', 'vd', 'res', 'lces', 'cmes'] as const;
export type ThieleSmallDerivedKey = (typeof thieleSmallDerivedKeys)[number];
export type ThieleSmallOutputKey = ThieleSmallKey | ThieleSmallDerivedKey;

/** SI: Hz, ohm, H, kg, m/N, N/m, N·s/m (mechanical ohm), T·m, m², m, m³. */
export type ThieleSmallInputs = Partial<Record<ThieleSmallKey, number>>;
export type ThieleSmallValues = Partial<Record<ThieleSmallOutputKey, number>>;

export interface Provenance {
  source: 'input' | 'derived';
  /** Quantities the value was computed from directly (empty for inputs). */
  from: ThieleSmallOutputKey[];
  /** The user inputs it ultimately rests on. */
  inputs: ThieleSmallKey[];
  formula: string;
}

export interface ConsistencyWarning {
  relation: string;
  fields: ThieleSmallOutputKey[];
  /** |given − implied| / implied. */
  relativeError: number;
  message: string;
}

export interface ThieleSmallResult {
  values: ThieleSmallValues;
  provenance: Partial<Record<ThieleSmallOutputKey, Provenance>>;
  warnings: ConsistencyWarning[];
  /** Outputs that could not be determined from the inputs given. */
  missing: ThieleSmallOutputKey[];
  air: AirProperties;
}

export interface ThieleSmallOptions {
  temperatureC?: number;
  pressurePa?: number;
  /** Relative disagreement above which over-determined inputs are reported; default 2 %. */
  tolerance?: number;
}

type Values = ThieleSmallValues;
type Solver = (v: Values) => number | undefined;

interface Relation {
  name: string;
  formula: string;
  vars: ThieleSmallOutputKey[];
  /** One solver per variable the relation can be solved for. */
  solve: Partial<Record<ThieleSmallOutputKey, Solver>>;
}

const TWO_PI = 2 * Math.PI;
const req = (v: Values, k: ThieleSmallOutputKey): number => v[k] as number;

function buildRelations(air: AirProperties): Relation[] {
  const rc2 = air.rho * air.c * air.c;
  // Both-sided air load of a baffled piston of radius a (Beranek & Mellow).
  const airLoad = (sd: number): number => 2 * (8 / 3) * air.rho * Math.pow(Math.sqrt(sd / Math.PI), 3);
  return [
    {
      name: 'stiffness', formula: 'kms = 1/cms', vars: ['kms', 'cms'],
      solve: { kms: (v) => 1 / req(v, 'cms'), cms: (v) => 1 / req(v, 'kms') },
    },
    {
      name: 'area', formula: 'sd = π·diameter²/4', vars: ['sd', 'diameter'],
      solve: {
        sd: (v) => (Math.PI * req(v, 'diameter') ** 2) / 4,
        diameter: (v) => 2 * Math.sqrt(req(v, 'sd') / Math.PI),
      },
    },
    {
      name: 'resonance', formula: 'fs = 1/(2π·√(mms·cms))', vars: ['fs', 'mms', 'cms'],
      solve: {
        fs: (v) => 1 / (TWO_PI * Math.sqrt(req(v, 'mms') * req(v, 'cms'))),
        mms: (v) => 1 / ((TWO_PI * req(v, 'fs')) ** 2 * req(v, 'cms')),
        cms: (v) => 1 / ((TWO_PI * req(v, 'fs')) ** 2 * req(v, 'mms')),
      },
    },
    {
      name: 'equivalent volume', formula: 'vas = ρ·c²·sd²·cms', vars: ['vas', 'sd', 'cms'],
      solve: {
        vas: (v) => rc2 * req(v, 'sd') ** 2 * req(v, 'cms'),
        cms: (v) => req(v, 'vas') / (rc2 * req(v, 'sd') ** 2),
        sd: (v) => Math.sqrt(req(v, 'vas') / (rc2 * req(v, 'cms'))),
      },
    },
    {
      name: 'mechanical Q', formula: 'qms = 2π·fs·mms/rms', vars: ['qms', 'fs', 'mms', 'rms'],
      solve: {
        qms: (v) => (TWO_PI * req(v, 'fs') * req(v, 'mms')) / req(v, 'rms'),
        rms: (v) => (TWO_PI * req(v, 'fs') * req(v, 'mms')) / req(v, 'qms'),
        mms: (v) => (req(v, 'qms') * req(v, 'rms')) / (TWO_PI * req(v, 'fs')),
      },
    },
    {
      name: 'electrical Q', formula: 'qes = 2π·fs·mms·re/bl²', vars: ['qes', 'fs', 'mms', 're', 'bl'],
      solve: {
        qes: (v) => (TWO_PI * req(v, 'fs') * req(v, 'mms') * req(v, 're')) / req(v, 'bl') ** 2,
        bl: (v) => Math.sqrt((TWO_PI * req(v, 'fs') * req(v, 'mms') * req(v, 're')) / req(v, 'qes')),
        re: (v) => (req(v, 'qes') * req(v, 'bl') ** 2) / (TWO_PI * req(v, 'fs') * req(v, 'mms')),
        mms: (v) => (req(v, 'qes') * req(v, 'bl') ** 2) / (TWO_PI * req(v, 'fs') * req(v, 're')),
      },
    },
    {
      name: 'total Q', formula: 'qts = qms·qes/(qms+qes)', vars: ['qts', 'qms', 'qes'],
      solve: {
        qts: (v) => (req(v, 'qms') * req(v, 'qes')) / (req(v, 'qms') + req(v, 'qes')),
        // Only defined while qts is below the other Q; otherwise the inputs are impossible.
        qes: (v) => (req(v, 'qms') > req(v, 'qts') ? (req(v, 'qms') * req(v, 'qts')) / (req(v, 'qms') - req(v, 'qts')) : undefined),
        qms: (v) => (req(v, 'qes') > req(v, 'qts') ? (req(v, 'qes') * req(v, 'qts')) / (req(v, 'qes') - req(v, 'qts')) : undefined),
      },
    },
    {
      name: 'air load', formula: 'mms = mmd + 2·(8/3)·ρ·a³, a = √(sd/π)', vars: ['mms', 'mmd', 'sd'],
      solve: {
        mms: (v) => req(v, 'mmd') + airLoad(req(v, 'sd')),
        mmd: (v) => {
          const m = req(v, 'mms') - airLoad(req(v, 'sd'));
          return m > 0 ? m : undefined;
        },
      },
    },
    {
      name: 'reference efficiency', formula: 'eta0 = 4π²·fs³·vas/(c³·qes)', vars: ['eta0', 'fs', 'vas', 'qes'],
      solve: { eta0: (v) => (4 * Math.PI ** 2 * req(v, 'fs') ** 3 * req(v, 'vas')) / (air.c ** 3 * req(v, 'qes')) },
    },
    {
      name: 'reference efficiency (mechanical form)', formula: 'eta0 = ρ·bl²·sd²/(2π·c·re·mms²)',
      vars: ['eta0', 'bl', 'sd', 're', 'mms'],
      solve: {
        eta0: (v) => (air.rho * req(v, 'bl') ** 2 * req(v, 'sd') ** 2) / (TWO_PI * air.c * req(v, 're') * req(v, 'mms') ** 2),
      },
    },
    {
      name: 'sensitivity 1 W / 1 m', formula: 'spl1w = 10·log10(ρ·c·eta0/(2π·1 m²)/p_ref²) (half space)',
      vars: ['spl1w', 'eta0'],
      solve: { spl1w: (v) => 10 * Math.log10((air.rho * air.c * req(v, 'eta0')) / TWO_PI / (P_REF * P_REF)) },
    },
    {
      name: 'sensitivity 2.83 V / 1 m', formula: 'spl283v = spl1w + 10·log10(2.83²/re)', vars: ['spl283v', 'spl1w', 're'],
      solve: { spl283v: (v) => req(v, 'spl1w') + 10 * Math.log10((DRIVE_2V83 * DRIVE_2V83) / req(v, 're')) },
    },
    { name: 'efficiency bandwidth product', formula: 'ebp = fs/qes', vars: ['ebp', 'fs', 'qes'], solve: { ebp: (v) => req(v, 'fs') / req(v, 'qes') } },
    { name: 'displacement volume', formula: 'vd = sd·xmax', vars: ['vd', 'sd', 'xmax'], solve: { vd: (v) => req(v, 'sd') * req(v, 'xmax') } },
    { name: 'motional resistance', formula: 'res = bl²/rms', vars: ['res', 'bl', 'rms'], solve: { res: (v) => req(v, 'bl') ** 2 / req(v, 'rms') } },
    { name: 'motional inductance', formula: 'lces = bl²·cms', vars: ['lces', 'bl', 'cms'], solve: { lces: (v) => req(v, 'bl') ** 2 * req(v, 'cms') } },
    { name: 'motional capacitance', formula: 'cmes = mms/bl²', vars: ['cmes', 'mms', 'bl'], solve: { cmes: (v) => req(v, 'mms') / req(v, 'bl') ** 2 } },
  ];
}

function fmt(x: number): string {
  return Number.isFinite(x) ? Number(x.toPrecision(4)).toString() : String(x);
}

/**
 * Completes a Thiele/Small set from any sufficient subset, states where every value came from,
 * and reports over-determined inputs that disagree by more than the tolerance.
 */
export function completeThieleSmall(inputs: ThieleSmallInputs, options: ThieleSmallOptions = {}): ThieleSmallResult {
  const air = airProperties(options.temperatureC, options.pressurePa);
  const tolerance = options.tolerance ?? 0.02;
  const relations = buildRelations(air);
  const values: Values = {};
  const provenance: Partial<Record<ThieleSmallOutputKey, Provenance>> = {};
  const warnings: ConsistencyWarning[] = [];

  for (const key of thieleSmallKeys) {
    const x = inputs[key];
    if (x === undefined) continue;
    if (!Number.isFinite(x) || x <= 0) {
      throw new RangeError(`${key} must be a positive finite number`);
    }
    values[key] = x;
    provenance[key] = { source: 'input', from: [], inputs: [key], formula: 'given' };
  }

  const known = (k: ThieleSmallOutputKey): boolean => values[k] !== undefined;
  let changed = true;
  while (changed) {
    changed = false;
    for (const rel of relations) {
      const unknown = rel.vars.filter((k) => !known(k));
      if (unknown.length !== 1) continue;
      const target = unknown[0];
      const solver = rel.solve[target];
      if (!solver) continue;
      const x = solver(values);
      if (x === undefined || !Number.isFinite(x) || (target !== 'spl1w' && target !== 'spl283v' && x <= 0)) continue;
      values[target] = x;
      const from = rel.vars.filter((k) => k !== target);
      const roots = new Set<ThieleSmallKey>();
      for (const f of from) for (const r of provenance[f]?.inputs ?? []) roots.add(r);
      provenance[target] = { source: 'derived', from, inputs: thieleSmallKeys.filter((k) => roots.has(k)), formula: rel.formula };
      changed = true;
    }
  }

  // Every relation whose variables are all known is re-evaluated; a disagreement can only come from inputs.
  for (const rel of relations) {
    if (!rel.vars.every(known)) continue;
    const primary = rel.vars[0];
    const solver = rel.solve[primary];
    if (!solver) continue;
    const implied = solver(values);
    const actual = values[primary] as number;
    if (implied === undefined || !Number.isFinite(implied)) continue;
    const isLevel = primary === 'spl1w' || primary === 'spl283v';
    const err = isLevel ? Math.abs(actual - implied) / 100 : Math.abs(actual - implied) / Math.abs(implied);
    if (err > tolerance) {
      const others = rel.vars.slice(1);
      warnings.push({
        relation: rel.formula,
        fields: rel.vars,
        relativeError: err,
        message: `${primary} = ${fmt(actual)} disagrees with ${rel.formula} = ${fmt(implied)} from ${others.join(', ')} (${fmt(err * 100)} % apart)`,
      });
    }
  }

  const { qts, qms, qes } = values;
  for (const [name, q] of [['qms', qms], ['qes', qes]] as const) {
    if (qts !== undefined && q !== undefined && q <= qts) {
      warnings.push({
        relation: `qts < ${name}`, fields: ['qts', name], relativeError: Math.abs(qts - q) / q,
        message: `qts = ${fmt(qts)} must be below ${name} = ${fmt(q)}`,
      });
    }
  }

  const allKeys: ThieleSmallOutputKey[] = [...thieleSmallKeys, ...thieleSmallDerivedKeys];
  return { values, provenance, warnings, missing: allKeys.filter((k) => !known(k)), air };
}

/** Small (1972): SPL at 1 W / 1 m in half space from reference efficiency. */
export function sensitivity1W(eta0: number, air: AirProperties = airProperties()): number {
  return 10 * Math.log10((air.rho * air.c * eta0) / TWO_PI / (P_REF * P_REF));
}

/** Small (1972): η0 = 4π²·fs³·Vas/(c³·Qes). */
export function referenceEfficiency(fs: number, vas: number, qes: number, air: AirProperties = airProperties()): number {
  return (4 * Math.PI ** 2 * fs ** 3 * vas) / (air.c ** 3 * qes);
}

/** Both-sided low-frequency air load of a baffled piston, 2·(8/3)·ρ·a³ (Beranek & Mellow). */
export function pistonAirLoadMass(sd: number, air: AirProperties = airProperties()): number {
  const a = Math.sqrt(sd / Math.PI);
  return 2 * (8 / 3) * air.rho * a ** 3;
}
