// The demo catalogue: invented makers and models. Every name here is made up; the curves are
// computed from each driver's own small-signal parameters so they behave like real drive units.
import type { DriverType } from '../../shared/schemas/drivers';

export interface DemoMaker {
  slug: string;
  name: string;
  country: string;
}

export interface DemoDriver {
  slug: string;
  makerSlug: string;
  model: string;
  type: DriverType;
  nominalSizeIn: number;
  nominalImpedanceOhm: number;
  /** Small-signal parameters, SI units. */
  ts: { fs: number; qms: number; qes: number; re: number; le: number; bl: number; mms: number; sd: number; xmax: number };
  /** Frequency of the first cone breakup, Hz, and its peak height in dB. */
  breakup: { hz: number; db: number };
}

export const demoMakers: DemoMaker[] = [
  { slug: 'halvard-acoustic', name: 'Halvard Acoustic', country: 'Norway' },
  { slug: 'orrin-transducers', name: 'Orrin Transducers', country: 'Canada' },
  { slug: 'kestrel-works', name: 'Kestrel Works', country: 'Japan' },
];

export const demoDrivers: DemoDriver[] = [
  {
    slug: 'halvard-m3-fibre', makerSlug: 'halvard-acoustic', model: 'M3 Fibre', type: 'mid-range', nominalSizeIn: 3, nominalImpedanceOhm: 4,
    ts: { fs: 105, qms: 3.2, qes: 0.78, re: 3.3, le: 0.00008, bl: 3.1, mms: 0.0031, sd: 0.0033, xmax: 0.0022 },
    breakup: { hz: 9200, db: 6 },
  },
  {
    slug: 'orrin-tm-80', makerSlug: 'orrin-transducers', model: 'TM-80 Alloy', type: 'mid-range', nominalSizeIn: 3, nominalImpedanceOhm: 8,
    ts: { fs: 118, qms: 4.1, qes: 0.92, re: 6.2, le: 0.00012, bl: 3.9, mms: 0.0028, sd: 0.0031, xmax: 0.0018 },
    breakup: { hz: 11800, db: 9 },
  },
  {
    slug: 'kestrel-w6-paper', makerSlug: 'kestrel-works', model: 'W6 Paper', type: 'mid-woofer', nominalSizeIn: 6.5, nominalImpedanceOhm: 8,
    ts: { fs: 42, qms: 3.6, qes: 0.41, re: 5.8, le: 0.00042, bl: 6.9, mms: 0.0158, sd: 0.0132, xmax: 0.0052 },
    breakup: { hz: 4800, db: 5 },
  },
  {
    slug: 'halvard-t25-dome', makerSlug: 'halvard-acoustic', model: 'T25 Dome', type: 'tweeter', nominalSizeIn: 1, nominalImpedanceOhm: 4,
    ts: { fs: 720, qms: 1.2, qes: 1.4, re: 3.4, le: 0.00003, bl: 2.6, mms: 0.00035, sd: 0.00071, xmax: 0.0003 },
    breakup: { hz: 26000, db: 7 },
  },
];
