import { useState } from 'react';
import { ActivityIndicator, Modal, ScrollView, StyleSheet, Text, View } from 'react-native';
import { ActionButton, Card, colors, DebouncedTextInput, fonts, radius, ScreenFrame, space, useBreakpoint } from '../../ui';
import { DriverCard } from '../components/driver-card';
import { FilterPanel } from '../components/filter-panel';
import { RoleSearch } from '../components/role-search';
import { useDrivers } from '../hooks/use-drivers';
import { useListParams } from '../hooks/use-list-params';
import { driverHref } from '../logic/driver-notes';
import { activeFilterCount, clearFilters, hasRole, pageOf, withParams, type ListParams } from '../logic/list-query';

export function DriverListScreen() {
  const [params, setParams] = useListParams();
  const wide = useBreakpoint() === 'wide';
  const { data, error, isLoading, isValidating } = useDrivers(params);
  const [sheetOpen, setSheetOpen] = useState(false);
  const filterCount = activeFilterCount(params);
  const page = data ? pageOf(params, data.total) : null;
  const band = hasRole(params) ? { bandLo: params.bandLo, bandHi: params.bandHi } : undefined;

  const results = (
    <View style={styles.results}>
      <RoleSearch params={params} onChange={setParams} />
      {error ? (
        <Text style={styles.error} testID="list-error" accessibilityRole="alert">
          {error.message}
        </Text>
      ) : null}
      {isLoading && !data ? <ActivityIndicator color={colors.accent} /> : null}
      {data && !error ? (
        <View style={styles.toolbar}>
          <Text style={styles.count} testID="driver-count">
            {data.total} {data.total === 1 ? 'driver' : 'drivers'}
            {data.role ? ` ranked for ${data.role.bandLo}–${data.role.bandHi} Hz at ${data.role.level} dB` : ''}
          </Text>
          {isValidating ? <ActivityIndicator size="small" color={colors.accent} /> : null}
        </View>
      ) : null}
      <View style={styles.grid} testID="driver-results">
        {error ? null : data?.items.map((d) => <DriverCard key={d.slug} driver={d} href={driverHref(d.slug, band)} />)}
      </View>
      {data && !error && data.items.length === 0 ? <Text style={styles.lede}>No driver matches this search. Try fewer filters or other words.</Text> : null}
      {page && !error && (page.prev != null || page.next != null) ? (
        <View style={styles.pager}>
          <ActionButton kind="secondary" label="← Previous" disabled={page.prev == null} onPress={() => setParams(withParams(params, { offset: page.prev ? String(page.prev) : undefined }))} testID="page-prev" />
          <Text style={styles.count} testID="page-range">
            {page.from}–{page.to} of {data?.total}
          </Text>
          <ActionButton kind="secondary" label="Next →" disabled={page.next == null} onPress={() => setParams(withParams(params, { offset: String(page.next) }))} testID="page-next" />
        </View>
      ) : null}
    </View>
  );

  return (
    <ScreenFrame testID="driver-list-screen">
      <View style={styles.header}>
        <Text style={styles.h1} accessibilityRole="header">Measured drivers</Text>
        <Text style={styles.lede}>Independent bench measurements, normalised to 2.83 V / 1 m on one frequency grid.</Text>
      </View>
      <View style={styles.searchRow}>
        <DebouncedTextInput
          value={params.q ?? ''}
          onCommit={(t) => setParams(withParams(params, { q: t }))}
          placeholder="Search maker or model (typos are fine)"
          style={styles.search}
          accessibilityLabel="Search maker or model"
          testID="driver-search"
        />
        {wide ? null : <ActionButton kind="secondary" label={`Filters (${filterCount})`} onPress={() => setSheetOpen(true)} testID="filters-button" />}
      </View>
      {wide ? (
        <View style={styles.split}>
          <Card style={styles.filterColumn} testID="filter-column">
            <View style={styles.filterHead}>
              <Text style={styles.h2}>Filters{filterCount ? ` (${filterCount})` : ''}</Text>
              {filterCount ? <ActionButton kind="quiet" label="Clear" onPress={() => setParams(clearFilters(params))} testID="filters-clear" /> : null}
            </View>
            <FilterPanel params={params} facets={data?.facets} onChange={setParams} />
          </Card>
          <View style={styles.resultsColumn}>{results}</View>
        </View>
      ) : (
        results
      )}
      {wide ? null : <FilterSheet open={sheetOpen} params={params} onClose={() => setSheetOpen(false)} onApply={(p) => { setParams(p); setSheetOpen(false); }} />}
    </ScreenFrame>
  );
}

/**
 * Phone filters: a full-height sheet over the list. Changes stay in a draft until Apply; the draft
 * is searched live so the counts and the Apply button tell what Apply would show.
 */
function FilterSheet({ open, params, onClose, onApply }: { open: boolean; params: ListParams; onClose: () => void; onApply: (p: ListParams) => void }) {
  const [draft, setDraft] = useState<ListParams>(params);
  const [wasOpen, setWasOpen] = useState(open);
  if (open !== wasOpen) {
    // Opening starts from what the URL holds now, not from an abandoned earlier draft.
    setWasOpen(open);
    if (open) setDraft(params);
  }
  const { data } = useDrivers(open ? draft : params);
  return (
    <Modal visible={open} animationType="slide" onRequestClose={onClose} transparent={false}>
      <View style={styles.sheet} testID="filters-sheet">
        <View style={styles.sheetHead}>
          <Text style={styles.h2} accessibilityRole="header">Filters ({activeFilterCount(draft)})</Text>
          <ActionButton kind="quiet" label="Close" onPress={onClose} testID="filters-close" />
        </View>
        <ScrollView contentContainerStyle={styles.sheetBody}>
          <FilterPanel params={draft} facets={data?.facets} onChange={setDraft} />
        </ScrollView>
        <View style={styles.sheetFoot}>
          <ActionButton kind="secondary" label="Clear" onPress={() => setDraft(clearFilters(draft))} testID="filters-clear" style={styles.footButton} />
          <ActionButton
            label={data ? `Apply · ${data.total} ${data.total === 1 ? 'driver' : 'drivers'}` : 'Apply'}
            onPress={() => onApply(draft)}
            testID="filters-apply"
            style={styles.footButton}
          />
        </View>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.xs },
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  h2: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  lede: { fontFamily: fonts.regular, fontSize: 15, color: colors.inkSoft },
  searchRow: { flexDirection: 'row', gap: space.sm, alignItems: 'stretch' },
  search: { flex: 1, fontSize: 16, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.sm },
  split: { flexDirection: 'row', gap: space.lg, alignItems: 'flex-start' },
  filterColumn: { width: 300, flexShrink: 0 },
  filterHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' },
  resultsColumn: { flex: 1, minWidth: 0 },
  results: { gap: space.md },
  toolbar: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  count: { fontFamily: fonts.semibold, fontSize: 13, color: colors.inkSoft },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  pager: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: space.sm },
  error: { fontFamily: fonts.semibold, color: colors.warn, backgroundColor: '#fdebe2', padding: space.md, borderRadius: radius.sm },
  sheet: { flex: 1, backgroundColor: colors.paper },
  sheetHead: {
    flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', paddingHorizontal: space.lg, paddingVertical: space.md,
    borderBottomWidth: 1, borderBottomColor: colors.rule, backgroundColor: colors.card,
  },
  sheetBody: { padding: space.lg },
  sheetFoot: { flexDirection: 'row', gap: space.sm, padding: space.lg, borderTopWidth: 1, borderTopColor: colors.rule, backgroundColor: colors.card },
  footButton: { flex: 1 },
});
