import { columnLimits } from '../../shared/schemas/column-limits';
import { ApiError } from '../http/api-error';
import { fitProfile } from './service';

// Invented profile; the limits are the users table's own (shared/schemas/column-limits.ts).
const base = { provider: 'github', id: '4242', login: 'invented-person', displayName: 'Invented Person', email: 'invented@example.invalid' };

describe('fitProfile', () => {
  it('leaves a profile that fits alone', () => {
    expect(fitProfile(base)).toEqual(base);
  });

  it('cuts a long display name and login by characters, never through a surrogate pair', () => {
    const fitted = fitProfile({ ...base, login: 'l'.repeat(100), displayName: `${'n'.repeat(119)}😀tail` });
    expect(fitted.login).toBe('l'.repeat(columnLimits.users.login));
    expect(fitted.displayName).toBe(`${'n'.repeat(119)}😀`);
    expect(Array.from(fitted.displayName)).toHaveLength(columnLimits.users.display_name);
  });

  it('drops an e-mail that does not fit rather than keeping part of it', () => {
    expect(fitProfile({ ...base, email: `${'x'.repeat(200)}@example.invalid` }).email).toBeNull();
  });

  it('refuses an account id that does not fit, since cutting it could join two accounts', () => {
    expect(() => fitProfile({ ...base, id: '9'.repeat(81) })).toThrow(ApiError);
  });
});
