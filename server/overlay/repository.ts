import type { Knex } from 'knex';

export interface SavedOverlayRow {
  code: string;
  title: string;
  note: string;
  entries: { driverId: number; setId: number | null }[];
  options: unknown;
  createdAt: string;
}

const parse = <T,>(v: unknown): T => (typeof v === 'string' ? JSON.parse(v) : v) as T;

export function createOverlayRepository(db: Knex) {
  return {
    async insertSaved(row: Omit<SavedOverlayRow, 'createdAt'> & { createdBy: number | null }): Promise<void> {
      await db('saved_overlays').insert({
        code: row.code, title: row.title, note: row.note, entries: JSON.stringify(row.entries), options: JSON.stringify(row.options), created_by: row.createdBy,
      });
    },

    async findSaved(code: string): Promise<SavedOverlayRow | undefined> {
      const r = await db('saved_overlays').where({ code }).first('code', 'title', 'note', 'entries', 'options', 'created_at as createdAt');
      if (!r) return undefined;
      return { ...r, entries: parse(r.entries), options: parse(r.options), createdAt: String(r.createdAt) };
    },

    async listSavedBy(userId: number): Promise<{ code: string; title: string; note: string; createdAt: string }[]> {
      const rows = await db('saved_overlays').where({ created_by: userId }).orderBy('id', 'desc').limit(200).select('code', 'title', 'note', 'created_at as createdAt');
      return rows.map((r: { code: string; title: string; note: string; createdAt: unknown }) => ({ ...r, createdAt: String(r.createdAt) }));
    },

    async codeExists(code: string): Promise<boolean> {
      return Boolean(await db('saved_overlays').where({ code }).first('id'));
    },

    async setBelongsTo(setId: number, driverId: number): Promise<boolean> {
      return Boolean(await db('measurement_sets').where({ id: setId, driver_id: driverId, status: 'approved' }).first('id'));
    },

    /** Where a set lives now: merges move sets to the surviving driver. */
    async driverOfSet(setId: number): Promise<number | undefined> {
      return (await db('measurement_sets').where({ id: setId }).first('driver_id'))?.driver_id;
    },
  };
}
export type OverlayRepository = ReturnType<typeof createOverlayRepository>;
