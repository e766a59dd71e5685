import { readFileSync } from 'node:fs';
import { join } from 'node:path';

const fixtures = join(__dirname, '..', 'fixtures', 'uploads');

/** A reviewer's upload of one fixture file (under any name) to stage it, and the raw response. */
export function uploadAs(url: string, cookie: string, fileName: string, fixture = 'spl-0deg-tab.txt'): Promise<Response> {
  const form = new FormData();
  form.append('files', new Blob([readFileSync(join(fixtures, fixture))]), fileName);
  form.append('meta', JSON.stringify([{ kind: 'spl', angleDeg: 0 }]));
  return fetch(`${url}/api/uploads/parse`, { method: 'POST', body: form, headers: { cookie, origin: url } });
}

export const testMethod = { driveVoltageV: 2.83, distanceM: 1, baffle: 'test baffle 600 x 400 mm' };

/** Stages one SPL file and submits it for `driver` (a new maker and model, or an existing slug). */
export async function submitWith(url: string, cookie: string, driver: Record<string, unknown>): Promise<Response> {
  const staged = await (await uploadAs(url, cookie, 'spl-0deg-tab.txt')).json();
  const token = staged.files?.[0]?.token;
  if (!token) throw new Error(`fixture upload did not stage: ${JSON.stringify(staged)}`);
  return fetch(`${url}/api/submissions`, {
    method: 'POST',
    body: JSON.stringify({ driver, method: testMethod, uploads: [token] }),
    headers: { cookie, origin: url, 'content-type': 'application/json' },
  });
}

/** A new driver entry as the submit form sends it. */
export const newDriver = (makerName: string, model: string) => ({ makerName, model, type: 'mid-range', nominalSizeIn: 3, nominalImpedanceOhm: 4 });

/** The field names of a 4xx error envelope. */
export async function fieldsOf(res: Response): Promise<string[]> {
  const body = await res.json();
  return (body.error?.details?.fields ?? []).map((f: { field: string }) => f.field);
}
