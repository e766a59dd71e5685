// The demo catalogue: invented makers, models, reviewers and prices, reproducible from a fixed
// seed. Nothing here describes a real product. Parameters are drawn from ranges typical of each
// kind of driver and made self-consistent through the Thiele/Small relations before any curve is
// computed from them.
import { slugOf } from '../../shared/catalogue/slug';
import type { BurnInState, DriverType } from '../../shared/schemas/drivers';

export interface DemoMaker {
  slug: string;
  name: string;
  country: string;
  series: string;
}

export interface DemoSetSpec {
  label: string;
  reviewer: string;
  sampleId: string;
  burnIn: BurnInState;
  /** Multipliers on the driver's base parameters for this sample or state. */
  tweak: { fs?: number; qms?: number; qes?: number; mms?: number; bl?: number };
  measuredOn: string;
  temperatureC: number;
}

export interface DemoDriver {
  slug: string;
  makerSlug: string;
  model: string;
  type: DriverType;
  nominalSizeIn: number;
  nominalImpedanceOhm: number;
  diaphragm: string;
  surround: string;
  voiceCoilDiameterM: number;
  magnet: string;
  price: number;
  availability: 'in-production' | 'limited' | 'discontinued';
  mounting: { cutoutM: number; outerM: number; depthM: number; boltCircleM: number; holes: number };
  /** Small-signal basis, SI. Bl and Cms follow from these. */
  ts: { fs: number; qms: number; qes: number; re: number; le: number; mms: number; sd: number; xmax: number };
  breakup: { frequency: number; q: number };
  largeSignal: { xBlFactor: number; xCFactor: number; xLFactor: number; blOffsetM: number };
  distortionVoltages: number[];
  /** How the maker's sheet departs from the truth (1 = honest). */
  specBias: { fs: number; sensitivityDb: number; xmax: number; vas: number };
  aliases: { kind: 'old-slug' | 'model-code' | 'former-name'; alias: string }[];
  sets: DemoSetSpec[];
}

export const demoMakers: DemoMaker[] = [
  { slug: 'halvard-acoustic', name: 'Halvard Acoustic', country: 'Norway', series: 'M' },
  { slug: 'orrin-transducers', name: 'Orrin Transducers', country: 'Canada', series: 'TM' },
  { slug: 'kestrel-works', name: 'Kestrel Works', country: 'Japan', series: 'KW' },
  { slug: 'veloria-sound', name: 'Veloria Sound', country: 'Italy', series: 'VS' },
  { slug: 'quillon-audio', name: 'Quillon Audio', country: 'Denmark', series: 'Q' },
  { slug: 'stellwerk-akustik', name: 'Stellwerk Akustik', country: 'Germany', series: 'SW' },
  { slug: 'nimbra-labs', name: 'Nimbra Labs', country: 'Portugal', series: 'NX' },
];

/** Invented bench names; reviewers in the demo are workshops, not people. */
export const demoReviewers = ['North Bench', 'Garage Lab Seven', 'Quiet Room Tests', 'Harbour Acoustics Club'];

/** mulberry32: a tiny, well-known 32-bit PRNG; enough for reproducible demo data. */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Template {
  type: DriverType;
  sizeIn: number;
  count: number;
  sdCm2: [number, number];
  fs: [number, number];
  qms: [number, number];
  qes: [number, number];
  mmsG: [number, number];
  leMh: [number, number];
  xmaxMm: [number, number];
  breakupHz: [number, number];
  impedances: number[];
  depthMm: [number, number];
  priceEur: [number, number];
  diaphragms: string[];
  volts: number[];
}

const cones = ['coated paper', 'woven glass fibre', 'aramid weave', 'polypropylene', 'anodised aluminium', 'mineral-filled polypropylene'];
const domes = ['silk dome', 'textile dome', 'aluminium dome', 'titanium dome', 'ceramic-coated dome'];

const templates: Template[] = [
  { type: 'tweeter', sizeIn: 1, count: 9, sdCm2: [6.2, 8.5], fs: [550, 950], qms: [0.9, 2.2], qes: [0.9, 2.4], mmsG: [0.25, 0.5], leMh: [0.02, 0.06], xmaxMm: [0.2, 0.5], breakupHz: [21000, 30000], impedances: [4, 6, 8], depthMm: [18, 32], priceEur: [35, 240], diaphragms: domes, volts: [1, 2.83, 5.66] },
  { type: 'mid-range', sizeIn: 3, count: 14, sdCm2: [24, 34], fs: [80, 140], qms: [2, 5], qes: [0.5, 1.2], mmsG: [2.4, 4.6], leMh: [0.05, 0.2], xmaxMm: [1.5, 3.2], breakupHz: [6500, 14000], impedances: [4, 8], depthMm: [32, 52], priceEur: [28, 190], diaphragms: cones, volts: [2.83, 5.66, 11.31] },
  { type: 'mid-range', sizeIn: 4, count: 4, sdCm2: [48, 56], fs: [65, 100], qms: [2, 5], qes: [0.45, 0.9], mmsG: [4.5, 7], leMh: [0.1, 0.3], xmaxMm: [2, 3.5], breakupHz: [5000, 9000], impedances: [4, 8], depthMm: [45, 62], priceEur: [40, 210], diaphragms: cones, volts: [2.83, 5.66, 11.31] },
  { type: 'full-range', sizeIn: 3, count: 5, sdCm2: [28, 36], fs: [85, 130], qms: [2, 4], qes: [0.4, 0.8], mmsG: [2, 3.5], leMh: [0.03, 0.12], xmaxMm: [2, 3.5], breakupHz: [13000, 18000], impedances: [4, 8], depthMm: [40, 56], priceEur: [30, 160], diaphragms: ['paper with whizzer', 'coated paper', 'aluminium'], volts: [2.83, 5.66, 11.31] },
  { type: 'mid-woofer', sizeIn: 6.5, count: 12, sdCm2: [120, 140], fs: [32, 58], qms: [2, 6], qes: [0.3, 0.6], mmsG: [10, 22], leMh: [0.3, 0.9], xmaxMm: [4, 7.5], breakupHz: [3500, 7000], impedances: [4, 8], depthMm: [62, 88], priceEur: [45, 320], diaphragms: cones, volts: [2.83, 5.66, 11.31] },
  { type: 'woofer', sizeIn: 8, count: 8, sdCm2: [200, 230], fs: [24, 40], qms: [2.5, 7], qes: [0.3, 0.5], mmsG: [25, 55], leMh: [0.6, 1.5], xmaxMm: [6, 10], breakupHz: [2000, 4000], impedances: [4, 8], depthMm: [85, 110], priceEur: [70, 380], diaphragms: cones, volts: [2.83, 8, 20] },
  { type: 'subwoofer', sizeIn: 12, count: 9, sdCm2: [460, 520], fs: [18, 32], qms: [3, 8], qes: [0.35, 0.6], mmsG: [90, 240], leMh: [1, 4], xmaxMm: [10, 20], breakupHz: [900, 1800], impedances: [2, 4], depthMm: [120, 180], priceEur: [120, 560], diaphragms: ['pressed paper', 'aluminium sandwich', 'glass-fibre composite'], volts: [2.83, 8, 20] },
];

const surrounds = ['rubber', 'foam', 'treated cloth'];
const magnets = ['ferrite', 'neodymium'];
const availability: DemoDriver['availability'][] = ['in-production', 'in-production', 'in-production', 'limited', 'discontinued'];

const round = (v: number, digits: number) => Number(v.toFixed(digits));

/** The whole demo catalogue, identical on every run for a given seed. */
export function generateDemoCatalogue(seed = 20261201): DemoDriver[] {
  const rnd = prng(seed);
  const range = ([lo, hi]: [number, number]) => lo + (hi - lo) * rnd();
  const choose = <T,>(xs: readonly T[]): T => xs[Math.floor(rnd() * xs.length)];
  const drivers: DemoDriver[] = [];
  const used = new Set<string>();
  let serial = 0;
  for (const t of templates) {
    for (let i = 0; i < t.count; i++) {
      serial++;
      const maker = demoMakers[(serial * 3 + Math.floor(rnd() * 2)) % demoMakers.length];
      const impedance = choose(t.impedances);
      const re = impedance === 2 ? range([1.5, 1.8]) : impedance === 4 ? range([3, 3.5]) : impedance === 6 ? range([4.6, 5.2]) : range([5.6, 6.6]);
      const diaphragm = choose(t.diaphragms);
      const materialWord = diaphragm.split(' ')[0].replace(/^\w/, (c) => c.toUpperCase()).replace('-filled', '');
      const sizeCode = t.type === 'tweeter' ? '25' : String(Math.round(t.sizeIn * 25.4 / 10) * 10);
      let model = `${maker.series}${t.type === 'tweeter' ? 'T' : ''}-${sizeCode}${String.fromCharCode(65 + (serial % 6))} ${materialWord}`;
      let slug = `${maker.slug}-${slugOf(model)}`;
      while (used.has(slug)) {
        model = `${model} II`;
        slug = `${maker.slug}-${slugOf(model)}`;
      }
      used.add(slug);
      const outer = t.sizeIn * 0.0254 * (t.type === 'tweeter' ? 2.6 : 1.12);
      const cutout = outer * (t.type === 'tweeter' ? 0.62 : 0.86);
      const sets: DemoSetSpec[] = [
        { label: 'Sample A', reviewer: choose(demoReviewers), sampleId: 'A', burnIn: 'out-of-box', tweak: {}, measuredOn: `2026-${String(1 + Math.floor(rnd() * 10)).padStart(2, '0')}-${String(1 + Math.floor(rnd() * 27)).padStart(2, '0')}`, temperatureC: round(range([19, 24]), 1) },
      ];
      drivers.push({
        slug,
        makerSlug: maker.slug,
        model,
        type: t.type,
        nominalSizeIn: t.sizeIn,
        nominalImpedanceOhm: impedance,
        diaphragm,
        surround: t.type === 'tweeter' ? 'integral' : choose(surrounds),
        voiceCoilDiameterM: round(t.type === 'tweeter' ? 0.025 : t.sizeIn * 0.0254 * range([0.2, 0.32]), 4),
        magnet: choose(magnets),
        price: round(range(t.priceEur), 0),
        availability: choose(availability),
        mounting: { outerM: round(outer, 4), cutoutM: round(cutout, 4), depthM: round(range(t.depthMm) / 1000, 4), boltCircleM: round((outer + cutout) / 2, 4), holes: t.type === 'subwoofer' ? 8 : t.type === 'tweeter' ? 3 : 4 },
        ts: {
          fs: round(range(t.fs), 1),
          qms: round(range(t.qms), 2),
          qes: round(range(t.qes), 3),
          re: round(re, 2),
          le: round(range(t.leMh) / 1000, 6),
          mms: round(range(t.mmsG) / 1000, 6),
          sd: round(range(t.sdCm2) / 1e4, 6),
          xmax: round(range(t.xmaxMm) / 1000, 5),
        },
        breakup: { frequency: round(range(t.breakupHz), 0), q: round(range([2, 5]), 2) },
        largeSignal: { xBlFactor: range([0.95, 1.25]), xCFactor: range([1.2, 1.7]), xLFactor: range([1.4, 2.2]), blOffsetM: round(range([-0.3, 0.3]) * t.sizeIn * 1e-4, 6) },
        distortionVoltages: t.volts,
        specBias: { fs: 1, sensitivityDb: 0, xmax: 1, vas: 1 },
        aliases: [{ kind: 'model-code', alias: `${maker.series}${sizeCode}${impedance}${String.fromCharCode(65 + (serial % 6))}` }],
        sets,
      });
    }
  }

  // Hand-picked stories the demo shows off: a renamed driver, sample spread, burn-in, an optimistic sheet.
  const mids = drivers.filter((d) => d.type === 'mid-range' && d.nominalSizeIn === 3);
  const hero = mids[0];
  hero.aliases.push({ kind: 'old-slug', alias: `${hero.makerSlug.split('-')[0]}-${slugOf(hero.model.split(' ')[0])}` }, { kind: 'former-name', alias: `${hero.model.split(' ')[0]} Mk1` });
  drivers.forEach((d, i) => {
    if (i % 7 === 2) {
      d.sets.push({ ...d.sets[0], label: 'Sample B', sampleId: 'B', tweak: { fs: 1 + (rnd() - 0.5) * 0.08, qms: 1 + (rnd() - 0.5) * 0.16, mms: 1 + (rnd() - 0.5) * 0.04, bl: 1 + (rnd() - 0.5) * 0.04 } });
    }
    if (i % 9 === 5) {
      // Burn-in loosens the suspension: lower Fs and Qms, a softer compliance (common practice, no source).
      d.sets.push({ ...d.sets[0], label: 'Sample A after burn-in', burnIn: 'burned-in', tweak: { fs: 0.88, qms: 0.93 } });
    }
    if (i % 6 === 1) d.specBias = { fs: 0.9, sensitivityDb: 2.5, xmax: 1.4, vas: 1.2 };
  });
  if (!hero.sets.some((s) => s.sampleId === 'B')) {
    hero.sets.push({ ...hero.sets[0], label: 'Sample B', sampleId: 'B', reviewer: demoReviewers[1], tweak: { fs: 1.035, qms: 0.94, mms: 0.99 } });
  }
  return drivers;
}
