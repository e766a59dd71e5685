import { findNearDuplicates, normaliseName, type NearDuplicateCandidate } from './near-duplicates';
import { slugOf } from './slug';

// Every maker and model here is invented.
let nextId = 1;
const driver = (makerName: string, model: string, extra: Partial<NearDuplicateCandidate> = {}): NearDuplicateCandidate => ({
  id: nextId++,
  slug: slugOf(`${makerName} ${model}`),
  makerName,
  model,
  aliases: [],
  status: 'listed',
  ...extra,
});

const km80 = driver('Kestrel Acoustics', 'KM-80 Mk2');
const km80mk3 = driver('Kestrel Acoustics', 'KM-80 Mk3');
const km120 = driver('Kestrel Acoustics', 'KM-120 Paper');
const brindle = driver('Brindle Audio', 'BX-12 Woofer');
const catalogue = [km80, km80mk3, km120, brindle];

describe('normaliseName', () => {
  it('keeps only lower-case letters and digits', () => {
    expect(normaliseName(' KM-80 Mk2 ')).toBe('km80mk2');
    expect(normaliseName('Ørsted-Klang É.3')).toBe('ørstedklange3');
  });
});

describe('findNearDuplicates', () => {
  it('calls the same model code under a close maker name strong, with reasons', () => {
    const found = findNearDuplicates({ makerName: 'kestrel acoustic', model: 'km80mk2' }, catalogue);
    expect(found.map((d) => d.id)).toEqual([km80.id]);
    expect(found[0]).toMatchObject({
      slug: km80.slug,
      strength: 'strong',
      reasons: ['same model code once spaces, dashes and case are ignored', 'maker name close to "Kestrel Acoustics"'],
    });
  });

  it('leaves out unrelated drivers, and other models of the same maker', () => {
    expect(findNearDuplicates({ makerName: 'Zzqx Nothing', model: 'QQ-000' }, catalogue)).toEqual([]);
    // Same maker, different size: not a duplicate of a KM-80.
    const found = findNearDuplicates({ makerName: 'Kestrel Acoustics', model: 'KM-80 Mk2' }, catalogue);
    expect(found.map((d) => d.id)).not.toContain(km120.id);
    expect(found.map((d) => d.id)).not.toContain(brindle.id);
  });

  it('treats a different number as a different driver', () => {
    // "Mk3" is one edit from "Mk2" but a successor, not the same unit.
    const found = findNearDuplicates({ makerName: 'Kestrel Acoustics', model: 'KM-80 Mk3' }, catalogue);
    expect(found.map((d) => d.id)).toEqual([km80mk3.id]);
  });

  it('includes pending entries and reports their status', () => {
    const pending = driver('Marrow Sound', 'MS-65 Ribbon', { status: 'pending' });
    const found = findNearDuplicates({ makerName: 'Marrow Sound', model: 'ms 65 ribbon' }, [...catalogue, pending]);
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ id: pending.id, status: 'pending', strength: 'strong' });
    expect(found[0].reasons).toContain('same maker');
  });

  it('matches an alias and names it', () => {
    const aliased = driver('Tolland Works', 'TW-200 Aramid', { aliases: ['TW200-AR', 'Tolland Two Hundred'] });
    const found = findNearDuplicates({ makerName: 'Tolland Works', model: 'tw200ar' }, [...catalogue, aliased]);
    expect(found.map((d) => d.id)).toEqual([aliased.id]);
    expect(found[0].strength).toBe('strong');
    expect(found[0].reasons).toEqual(['matches the alias "TW200-AR"', 'same maker']);
    expect(found[0].aliases).toEqual(['TW200-AR', 'Tolland Two Hundred']);
  });

  it('calls a close model under the same maker strong', () => {
    // One letter dropped from the cone material.
    const found = findNearDuplicates({ makerName: 'Kestrel Acoustics', model: 'KM-120 Papr' }, catalogue);
    expect(found.map((d) => d.id)).toEqual([km120.id]);
    expect(found[0]).toMatchObject({ strength: 'strong', reasons: ['model name close to "KM-120 Paper"', 'same maker'] });
  });

  it('matches a bare model code against a name with a cone suffix', () => {
    const found = findNearDuplicates({ makerName: 'Kestrel Acoustics', model: 'KM120' }, catalogue);
    expect(found.map((d) => d.id)).toEqual([km120.id]);
    expect(found[0].strength).toBe('strong');
  });

  it('calls the same model under a different maker only possible', () => {
    const found = findNearDuplicates({ makerName: 'Quarry Labs', model: 'BX12 woofer' }, catalogue);
    expect(found.map((d) => d.id)).toEqual([brindle.id]);
    expect(found[0]).toMatchObject({ strength: 'possible', reasons: ['same model code once spaces, dashes and case are ignored', 'listed under a different maker, "Brindle Audio"'] });
  });

  it('drops a merely close model under a different maker', () => {
    expect(findNearDuplicates({ makerName: 'Quarry Labs', model: 'BX-12 Wooferr' }, catalogue)).toEqual([]);
  });

  it('sorts strong before possible, then by closeness', () => {
    const exactOtherMaker = driver('Fenwick Audio', 'RX-44 Coated');
    const closeCloseMaker = driver('Ridley Loudspeaker', 'RX-44 Coatedd');
    const closeSameMaker = driver('Ridley Loudspeakers', 'RX-44 Coatd');
    const exactCloseMaker = driver('Ridley Loudspeaker', 'RX-44 Coated');
    const exactSameMaker = driver('Ridley Loudspeakers', 'RX-44 Coated');
    // Listed in the reverse of the expected order, so an unsorted result fails.
    const found = findNearDuplicates({ makerName: 'Ridley Loudspeakers', model: 'rx44coated' }, [exactOtherMaker, closeCloseMaker, closeSameMaker, exactCloseMaker, exactSameMaker]);
    expect(found.map((d) => [d.id, d.strength])).toEqual([
      [exactSameMaker.id, 'strong'],
      // The model weighs more than the maker: an exact model under a close maker comes before a
      // close model under the same maker.
      [exactCloseMaker.id, 'strong'],
      [closeSameMaker.id, 'strong'],
      [closeCloseMaker.id, 'possible'],
      [exactOtherMaker.id, 'possible'],
    ]);
  });

  it('returns at most `limit` entries', () => {
    const many = Array.from({ length: 8 }, () => driver('Harrow Audio', 'HA-30 Dome'));
    expect(findNearDuplicates({ makerName: 'Harrow Audio', model: 'HA-30 Dome' }, many)).toHaveLength(5);
    expect(findNearDuplicates({ makerName: 'Harrow Audio', model: 'HA-30 Dome' }, many, 2).map((d) => d.id)).toEqual([many[0].id, many[1].id]);
  });

  it('finds nothing for a model with no letters or digits', () => {
    expect(findNearDuplicates({ makerName: 'Kestrel Acoustics', model: ' -- ' }, catalogue)).toEqual([]);
  });
});
