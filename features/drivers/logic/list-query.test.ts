import {
  activeFilterCount, applyPreset, clearFilters, clearRole, listApiPath, pageOf, paramsFromSearch, roleBandProblem, rolePresets, routerParams, sortChoices, toggleType, withParams,
} from './list-query';

describe('URL params to search state', () => {
  it('keeps the API names, the first of repeated values, and drops empties and unknown names', () => {
    expect(paramsFromSearch({ q: ' woofr ', type: ['mid-range', 'tweeter'], fsMax: '', utm: 'x', bandLo: '300' })).toEqual({ q: 'woofr', type: 'mid-range', bandLo: '300' });
  });

  it('serialises to the API query in a fixed order with the page size', () => {
    expect(listApiPath({ sizeMax: '4', q: 'mid', type: 'mid-range,tweeter' })).toBe('/api/drivers?q=mid&type=mid-range%2Ctweeter&sizeMax=4&limit=24');
  });

  it('ranks by role when a band is set and no other order was picked', () => {
    expect(listApiPath({ bandLo: '300', bandHi: '3000', level: '90' })).toBe('/api/drivers?bandLo=300&bandHi=3000&level=90&sort=role&limit=24');
    expect(listApiPath({ bandLo: '300', bandHi: '3000', sort: 'price' })).toContain('sort=price');
  });

  it('leaves out a band the server would refuse and says in the form what is wrong with it', () => {
    const upsideDown = { bandLo: '3000', bandHi: '300', level: '90', q: 'mid' };
    expect(listApiPath(upsideDown)).toBe('/api/drivers?q=mid&level=90&limit=24');
    expect(roleBandProblem(upsideDown)).toBe('Band high must be above Band low (by at least 5 %)');
    expect(roleBandProblem({ bandLo: '5', bandHi: '300' })).toBe('Band low must be between 10 and 40000 Hz');
    expect(roleBandProblem({ bandLo: '300', bandHi: '3000' })).toBeNull();
    // Half a band is still being typed: nothing to complain about yet.
    expect(roleBandProblem({ bandLo: '300' })).toBeNull();
  });

  it('gives the router every name, undefined when unset, so stale values are removed', () => {
    const r = routerParams({ q: 'x' });
    expect(r.q).toBe('x');
    expect('fsMin' in r && r.fsMin === undefined).toBe(true);
  });
});

describe('changing the search', () => {
  it('returns to the first page on a filter change but not on paging', () => {
    expect(withParams({ q: 'a', offset: '24' }, { fsMin: '50' })).toEqual({ q: 'a', fsMin: '50' });
    expect(withParams({ q: 'a' }, { offset: '24' })).toEqual({ q: 'a', offset: '24' });
    expect(withParams({ q: 'a', fsMin: '50' }, { fsMin: ' ' })).toEqual({ q: 'a' });
  });

  it('toggles types in the comma-joined list in a stable order', () => {
    const a = toggleType({}, 'tweeter');
    const b = toggleType(a, 'mid-range');
    expect(b.type).toBe('mid-range,tweeter');
    expect(toggleType(b, 'tweeter').type).toBe('mid-range');
    expect(toggleType({ type: 'tweeter' }, 'tweeter').type).toBeUndefined();
  });

  it('counts filters: each type, impedance, each range with either end; not the role band', () => {
    expect(activeFilterCount({ q: 'x', type: 'mid-range,tweeter', impedance: '4', fsMin: '40', fsMax: '90', qtsMax: '0.5', bandLo: '300', bandHi: '3000', sort: 'fs' })).toBe(5);
    expect(activeFilterCount({ q: 'x' })).toBe(0);
  });

  it('clears filters but keeps the search text, the role band and the order', () => {
    expect(clearFilters({ q: 'x', type: 'tweeter', fsMin: '20', sort: 'fs', order: 'desc', bandLo: '1', bandHi: '2', offset: '24' })).toEqual({ q: 'x', sort: 'fs', order: 'desc', bandLo: '1', bandHi: '2' });
  });

  it('applies a role preset and clears it again', () => {
    const mid = rolePresets.find((p) => p.id === 'mid3');
    if (!mid) throw new Error('preset missing');
    const p = applyPreset({ q: 'cone', offset: '48' }, mid);
    expect(p).toEqual({ q: 'cone', type: 'mid-range', sizeMin: '2.5', sizeMax: '3.5', bandLo: '300', bandHi: '3000', level: '90', sort: 'role' });
    expect(clearRole(p)).toEqual({ q: 'cone', type: 'mid-range', sizeMin: '2.5', sizeMax: '3.5' });
  });

  it('offers relevance only with search text and role only with a band', () => {
    expect(sortChoices({})).not.toContain('relevance');
    expect(sortChoices({})).not.toContain('role');
    expect(sortChoices({ q: 'a', bandLo: '1', bandHi: '9' })).toEqual(expect.arrayContaining(['relevance', 'role']));
  });
});

describe('pageOf', () => {
  it('describes the window and the neighbours', () => {
    expect(pageOf({ offset: '24' }, 60)).toEqual({ offset: 24, from: 25, to: 48, prev: 0, next: 48 });
    expect(pageOf({}, 10)).toEqual({ offset: 0, from: 1, to: 10, prev: null, next: null });
    expect(pageOf({ offset: 'junk' }, 0)).toEqual({ offset: 0, from: 0, to: 0, prev: null, next: null });
  });
});
