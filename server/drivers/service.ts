import Fuse from 'fuse.js';
import type { DriverDetail, DriverListQuery, DriverListResponse, DriverSummary } from '../../shared/schemas/drivers';
import { notFound } from '../http/api-error';
import type { DriverRow, DriversRepository } from './repository';

function summarise(row: DriverRow, params: Map<string, number>): DriverSummary {
  return {
    slug: row.slug,
    model: row.model,
    maker: { slug: row.makerSlug, name: row.makerName },
    type: row.type,
    nominalSizeIn: row.nominalSizeIn,
    nominalImpedanceOhm: row.nominalImpedanceOhm,
    fsHz: params.get('fs') ?? null,
    qts: params.get('qts') ?? null,
    sensitivityDb: params.get('spl283v') ?? null,
  };
}

export function createDriversService(repo: DriversRepository) {
  async function headline(rows: DriverRow[]): Promise<Map<number, Map<string, number>>> {
    const params = await repo.headlineParameters(rows.map((r) => r.id), ['fs', 'qts', 'spl283v']);
    const byDriver = new Map<number, Map<string, number>>();
    for (const p of params) {
      const m = byDriver.get(p.driverId) ?? new Map<string, number>();
      // First approved set wins, so a later sample does not change the card.
      if (!m.has(p.name)) m.set(p.name, p.value);
      byDriver.set(p.driverId, m);
    }
    return byDriver;
  }

  return {
    async list(query: DriverListQuery): Promise<DriverListResponse> {
      let rows = await repo.listDrivers({ type: query.type });
      if (query.q) {
        const fuse = new Fuse(rows, { keys: ['makerName', 'model', 'slug'], threshold: 0.4, ignoreLocation: true });
        rows = fuse.search(query.q).map((r) => r.item);
      }
      const total = rows.length;
      const page = rows.slice(query.offset, query.offset + query.limit);
      const params = await headline(page);
      return { items: page.map((r) => summarise(r, params.get(r.id) ?? new Map())), total };
    },

    async get(slug: string): Promise<DriverDetail> {
      const row = await repo.findDriverBySlug(slug);
      if (!row) throw notFound(`Driver "${slug}"`);
      const sets = await repo.setsForDriver(row.id);
      const setIds = sets.map((s) => s.id);
      const [params, curves] = await Promise.all([repo.parametersForSets(setIds), repo.curvesForSets(setIds)]);
      const head = await headline([row]);
      return {
        ...summarise(row, head.get(row.id) ?? new Map()),
        measurementSets: sets.map((s) => ({
          id: s.id,
          label: s.label,
          driveVoltageV: s.driveVoltageV,
          distanceM: s.distanceM,
          baffle: s.baffle,
          gating: s.gating,
          temperatureC: s.temperatureC,
          measuredOn: s.measuredOn,
          sampleId: s.sampleId,
          parameters: params.filter((p) => p.setId === s.id).map(({ name, value, unit }) => ({ name, value, unit })),
          curves: curves.filter((c) => c.setId === s.id).map(({ setId: _setId, ...c }) => c),
        })),
      };
    },
  };
}
