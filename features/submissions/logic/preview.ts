import type { MeasurementSet } from '../../../shared/schemas/drivers';
import { DISTORTION_KINDS } from '../../../shared/uploads';
import { methodBody, readNumber, splShiftDb, type Draft } from './draft';

/**
 * The draft as a measurement set, so the preview draws it with the same charts as a driver page.
 * Curves are the points the server read; SPL carries the shift to 2.83 V / 1 m that the server
 * applies on submit. Files not read, or without a valid description, are left out.
 */
export function previewSet(draft: Draft): MeasurementSet {
  const method = methodBody(draft.method);
  const m = method.ok ? method.value : null;
  const shift = m ? splShiftDb(m.driveVoltageV, m.distanceM) : 0;
  const curves: MeasurementSet['curves'] = [];
  for (const f of draft.files) {
    if (f.status !== 'read' || !f.points) continue;
    const angle = readNumber(f.angle);
    const level = readNumber(f.level);
    curves.push({
      kind: f.kind,
      angleDeg: f.kind === 'spl' ? (angle ?? 0) : null,
      driveLevelV: DISTORTION_KINDS.includes(f.kind) ? (level ?? null) : null,
      x: f.points.x,
      y: f.kind === 'spl' ? f.points.y.map((v) => v + shift) : f.points.y,
      phase: f.points.phase,
    });
  }
  const anglesDeg = [...new Set(curves.filter((c) => c.kind === 'spl').map((c) => c.angleDeg as number))].sort((a, b) => a - b);
  return {
    id: 0, label: 'Preview', reviewer: 'you', sampleId: m?.sampleId ?? null, burnIn: m?.burnIn ?? 'out-of-box',
    // The preview shows SPL already referred, so the charts label it as 2.83 V / 1 m.
    driveVoltageV: 2.83, distanceM: 1, baffle: m?.baffle ?? '', gating: m?.gating ?? null, temperatureC: m?.temperatureC ?? null, measuredOn: m?.measuredOn ?? null,
    anglesDeg, parameters: [], curves,
  };
}
