import { StyleSheet, Text, View } from 'react-native';
import { driverTypes, type DriverFacets } from '../../../shared/schemas/drivers';
import { colors, DebouncedTextInput, fonts, space, ToggleChip } from '../../ui';
import { rangeFilters, selectedTypes, sortChoices, sortLabels, toggleType, withParams, type ListParams } from '../logic/list-query';

// Only digits, one decimal point and a leading minus get into a number box; the server still
// validates the rest (min above max, out of range) and its message is shown.
const numeric = (s: string) => s.replace(/,/g, '.').replace(/[^0-9.-]/g, '');

const countOf = (list: readonly { value: string; count: number }[] | undefined, value: string) => list?.find((f) => f.value === value)?.count;

function hint(range: { min: number | null; max: number | null } | undefined, unit: string): string | null {
  if (!range || range.min == null || range.max == null) return null;
  const f = (v: number) => String(Number(v.toPrecision(3)));
  return `${f(range.min)}–${f(range.max)}${unit ? ` ${unit}` : ''} listed`;
}

function Section({ title, children, note }: { title: string; children: React.ReactNode; note?: string | null }) {
  return (
    <View style={styles.section}>
      <View style={styles.sectionHead}>
        <Text style={styles.sectionTitle}>{title}</Text>
        {note ? <Text style={styles.note}>{note}</Text> : null}
      </View>
      {children}
    </View>
  );
}

/** Every filter, controlled: the wide layout applies changes at once, the phone sheet on Apply. */
export function FilterPanel({ params, facets, onChange }: { params: ListParams; facets: DriverFacets | undefined; onChange: (next: ListParams) => void }) {
  const types = selectedTypes(params);
  const sizeChip = (v: string) => params.sizeMin === v && params.sizeMax === v;
  return (
    <View style={styles.panel} testID="filter-panel">
      <Section title="Type">
        <View style={styles.chips}>
          {driverTypes.map((t) => (
            <ToggleChip key={t} label={t} selected={types.includes(t)} count={countOf(facets?.type, t) ?? (facets ? 0 : undefined)} onPress={() => onChange(toggleType(params, t))} testID={`filter-type-${t}`} />
          ))}
        </View>
      </Section>
      <Section title="Size (in)">
        <View style={styles.chips}>
          {(facets?.size ?? []).map((f) => (
            <ToggleChip
              key={f.value}
              label={`${f.value}″`}
              count={f.count}
              selected={sizeChip(f.value)}
              onPress={() => onChange(withParams(params, sizeChip(f.value) ? { sizeMin: undefined, sizeMax: undefined } : { sizeMin: f.value, sizeMax: f.value }))}
              testID={`filter-size-${f.value}`}
            />
          ))}
        </View>
        <RangeInputs params={params} onChange={onChange} min="sizeMin" max="sizeMax" label="Size" testKey="size" />
      </Section>
      <Section title="Impedance (Ω)">
        <View style={styles.chips}>
          {(facets?.impedance ?? []).map((f) => (
            <ToggleChip
              key={f.value}
              label={`${f.value} Ω`}
              count={f.count}
              selected={params.impedance === f.value}
              onPress={() => onChange(withParams(params, { impedance: params.impedance === f.value ? undefined : f.value }))}
              testID={`filter-impedance-${f.value}`}
            />
          ))}
        </View>
      </Section>
      {rangeFilters
        .filter((r) => r.key !== 'size')
        .map((r) => (
          <Section key={r.key} title={`${r.label}${r.unit ? ` (${r.unit})` : ''}`} note={hint(r.facet ? facets?.[r.facet] : undefined, r.unit)}>
            <RangeInputs params={params} onChange={onChange} min={r.min} max={r.max} label={r.label} testKey={r.key} />
          </Section>
        ))}
      <Section title="Order">
        <View style={styles.chips}>
          {sortChoices(params).map((k) => (
            <ToggleChip
              key={k}
              label={sortLabels[k]}
              selected={(params.sort ?? (params.bandLo && params.bandHi ? 'role' : params.q ? 'relevance' : '')) === k}
              onPress={() => onChange(withParams(params, { sort: k }))}
              testID={`sort-${k}`}
            />
          ))}
        </View>
        <View style={styles.chips}>
          <ToggleChip label="Ascending" selected={params.order !== 'desc'} onPress={() => onChange(withParams(params, { order: undefined }))} testID="order-asc" />
          <ToggleChip label="Descending" selected={params.order === 'desc'} onPress={() => onChange(withParams(params, { order: 'desc' }))} testID="order-desc" />
        </View>
      </Section>
    </View>
  );
}

type RangeName = (typeof rangeFilters)[number]['min'] | (typeof rangeFilters)[number]['max'];

function RangeInputs({ params, onChange, min, max, label, testKey }: { params: ListParams; onChange: (p: ListParams) => void; min: RangeName; max: RangeName; label: string; testKey: string }) {
  return (
    <View style={styles.range}>
      <DebouncedTextInput
        value={params[min] ?? ''}
        onCommit={(t) => onChange(withParams(params, { [min]: numeric(t) }))}
        placeholder="min"
        inputMode="decimal"
        accessibilityLabel={`${label} minimum`}
        testID={`filter-${testKey}-min`}
        style={styles.rangeInput}
      />
      <Text style={styles.note}>to</Text>
      <DebouncedTextInput
        value={params[max] ?? ''}
        onCommit={(t) => onChange(withParams(params, { [max]: numeric(t) }))}
        placeholder="max"
        inputMode="decimal"
        accessibilityLabel={`${label} maximum`}
        testID={`filter-${testKey}-max`}
        style={styles.rangeInput}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.lg },
  section: { gap: space.sm },
  sectionHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', flexWrap: 'wrap', gap: space.xs },
  sectionTitle: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
  note: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  range: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  rangeInput: { flex: 1, width: 0 },
});
