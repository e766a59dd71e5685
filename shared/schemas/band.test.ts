import { bandProblem, isValidBand } from './band';
import { driverDetailQuerySchema, driverListQuerySchema } from './drivers';
import { overlayOptionsSchema, overlayQuerySchema } from './overlay';

// The 10 Hz–40 kHz edges and the 5 % minimum width are this project's rule (common practice, no source).
describe('the band rule', () => {
  it('accepts a band whose high edge is more than 5 % above the low one, within 10 Hz to 40 kHz', () => {
    expect(isValidBand(300, 3000)).toBe(true);
    expect(isValidBand(10, 40000)).toBe(true);
    expect(isValidBand(1000, 1051)).toBe(true);
  });

  it('says what is wrong otherwise', () => {
    expect(bandProblem(3000, 300)).toBe('bandHi must be above bandLo (by at least 5 %)');
    expect(bandProblem(1000, 1050)).toBe('bandHi must be above bandLo (by at least 5 %)');
    expect(bandProblem(9, 300)).toBe('bandLo must be between 10 and 40000 Hz');
    expect(bandProblem(300, Number.NaN)).toBe('bandHi must be between 10 and 40000 Hz');
  });

  it('is the one check every schema with a band applies', () => {
    const issues = (r: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) => r.error?.issues.map((i) => i.path.join('.'));
    for (const schema of [driverListQuerySchema, driverDetailQuerySchema]) {
      expect(issues(schema.safeParse({ bandLo: '3000', bandHi: '300' }))).toEqual(['bandHi']);
      expect(schema.safeParse({ bandLo: '300', bandHi: '3000' }).success).toBe(true);
    }
    expect(issues(overlayQuerySchema.safeParse({ drivers: 'a', bandLo: '3000', bandHi: '300' }))).toEqual(['bandHi']);
    expect(issues(overlayOptionsSchema.safeParse({ bandLo: 3000, bandHi: 300 }))).toEqual(['bandHi']);
    expect(issues(overlayOptionsSchema.safeParse({ bandLo: 300 }))).toEqual(['bandHi']);
  });
});
