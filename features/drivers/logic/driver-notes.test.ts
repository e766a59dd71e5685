import { aliasRedirect, cautionsFor, driverHref, rememberRedirect, roleDisplay, takeRedirectNote } from './driver-notes';

describe('alias redirect', () => {
  it('redirects only when the requested slug is an old one', () => {
    expect(aliasRedirect({ slug: 'a-new', requestedSlug: 'a-old' })).toEqual({ from: 'a-old', to: 'a-new' });
    expect(aliasRedirect({ slug: 'a-new', requestedSlug: 'a-new' })).toBeNull();
  });

  it('remembers the old name for the screen the redirect lands on', () => {
    rememberRedirect({ from: 'x-old', to: 'x-new' });
    expect(takeRedirectNote('x-new')).toBe('x-old');
    expect(takeRedirectNote('other')).toBeNull();
  });

  it('carries a complete role band to the detail page', () => {
    expect(driverHref('a-b', { bandLo: '300', bandHi: '3000' })).toBe('/drivers/a-b?bandLo=300&bandHi=3000');
    expect(driverHref('a-b', { bandLo: '300' })).toBe('/drivers/a-b');
    expect(driverHref('a-b', { bandLo: '3000', bandHi: '300' })).toBe('/drivers/a-b');
    expect(driverHref('a-b', { bandLo: '1000', bandHi: '1040' })).toBe('/drivers/a-b');
  });
});

describe('cautions', () => {
  it('mentions vehicle doors for mid-ranges and car-size woofers, not for tweeters or large subs', () => {
    expect(cautionsFor({ type: 'mid-range', nominalSizeIn: 3 }).map((c) => c.id)).toEqual(['cutting', 'vehicle-door', 'hearing', 'amplifier']);
    expect(cautionsFor({ type: 'woofer', nominalSizeIn: 6.5 }).map((c) => c.id)).toContain('vehicle-door');
    expect(cautionsFor({ type: 'tweeter', nominalSizeIn: 1 }).map((c) => c.id)).not.toContain('vehicle-door');
    expect(cautionsFor({ type: 'subwoofer', nominalSizeIn: 12 }).map((c) => c.id)).not.toContain('vehicle-door');
  });
});

describe('roleDisplay', () => {
  it('formats rank, score and the figures that are present', () => {
    const d = roleDisplay({ score: 0.8734, rank: 2, sensitivityDb: 86.04, linearityDb: 1.74, thdPercent: 0.4321, beamingHz: 4500, reasons: ['flat in band'] });
    expect(d.rank).toBe('#2');
    expect(d.score).toBe('0.87');
    expect(d.figures).toEqual([
      { label: 'In band', value: '86.0 dB' },
      { label: 'Linearity', value: '±1.7 dB' },
      { label: 'THD at level', value: '0.43 %' },
      { label: 'Beaming from', value: '4.5 kHz' },
    ]);
    expect(roleDisplay({ score: 0, rank: 9, sensitivityDb: null, linearityDb: null, thdPercent: null, beamingHz: 800, reasons: [] }).figures).toEqual([{ label: 'Beaming from', value: '800 Hz' }]);
  });
});
