// The searchable summary of a driver, computed from its primary measurement set.
import type { Curve, DriverType, Parameter } from '../schemas/drivers';
import { referenceBandFor } from '../schemas/drivers';
import { meanSensitivity } from '../acoustics/figures';
import { buildRoleBands, type RoleBands } from './role-index';

export interface IndexRow {
  fsHz: number | null;
  qts: number | null;
  vasM3: number | null;
  xmaxM: number | null;
  sensitivityDb: number | null;
  bands: RoleBands;
}

/** Off-axis angle summarised for beaming in search (common practice, no source). */
export const INDEX_OFF_AXIS_DEG = 60;

export function computeIndexRow(type: DriverType, set: { parameters: readonly Pick<Parameter, 'name' | 'value'>[]; curves: readonly Curve[] }): IndexRow {
  const p = (n: string) => set.parameters.find((x) => x.name === n)?.value ?? null;
  const on = set.curves.find((c) => c.kind === 'spl' && (c.angleDeg ?? 0) === 0) ?? null;
  const off = set.curves.find((c) => c.kind === 'spl' && c.angleDeg === INDEX_OFF_AXIS_DEG) ?? null;
  const thd = set.curves.filter((c) => c.kind === 'thd' && c.driveLevelV !== null).map((c) => ({ levelV: c.driveLevelV as number, curve: c }));
  const band = referenceBandFor(type);
  let sensitivityDb: number | null = null;
  if (on) {
    try {
      sensitivityDb = Number(meanSensitivity(on.x, on.y, band.lo, band.hi).toFixed(2));
    } catch {
      sensitivityDb = null;
    }
  }
  return {
    fsHz: p('fs'),
    qts: p('qts'),
    vasM3: p('vas'),
    xmaxM: p('xmax'),
    sensitivityDb,
    bands: buildRoleBands({ onAxis: on, offAxis: off ? { angleDeg: INDEX_OFF_AXIS_DEG, curve: off } : null, thd }),
  };
}
