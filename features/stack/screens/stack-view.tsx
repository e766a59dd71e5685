import { useCallback, useMemo, type ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import type { OverlayOptions } from '../../../shared/schemas/overlay';
import { createChartCursor, type PngExport } from '../../charts';
import { colors, fonts, space, useBreakpoint } from '../../ui';
import { ExportBar } from '../components/export-bar';
import { SaveForm } from '../components/save-form';
import { StackCharts, useStackChartSet, type StackChartSet } from '../components/stack-charts';
import { StackOptionsBar } from '../components/stack-options-bar';
import { StackSearch, StackSlots } from '../components/stack-slots';
import { StackTable } from '../components/stack-table';
import { useOverlay } from '../hooks/use-overlay';
import { buildCsv } from '../logic/csv';
import { normaliseDrivers, thdLevels } from '../logic/curves';
import { bandOf, describeNormalisation, type StackEntry } from '../logic/stack-options';
import { driverLabel } from '../logic/stack-series';

const X: readonly [number, number] = [20, 20000];
const emptyGrid: number[] = [];

export interface StackViewProps {
  entries: readonly StackEntry[];
  options: OverlayOptions;
  onEntries?: (entries: StackEntry[]) => void;
  onOptions?: (patch: Partial<OverlayOptions>) => void;
  /** The embed shows only the charts, the legend and a source line. */
  mode?: 'full' | 'embed';
  title?: string;
  header?: ReactNode;
}

function pngSpec(title: string, set: StackChartSet, o: OverlayOptions, legend: PngExport['legend'], normalisation: string): PngExport {
  const band = bandOf(o);
  const highlight = o.highlight ? ([band.lo, band.hi] as const) : null;
  return {
    width: 1200,
    title,
    lines: [`Measured at 2.83 V / 1 m · ${normalisation}`, 'Conestack · independently measured drive units'],
    legend,
    charts: [
      { title: 'Frequency response (dB)', series: set.spl, options: { xDomain: X, yDomain: set.splY, yStep: 5 }, height: 300, highlight },
      {
        title: `Total harmonic distortion${set.thdLevelV != null ? ` at ${set.thdLevelV} V` : ''} (${o.thdUnit === 'percent' ? '%' : 'dB'})`,
        series: set.thd,
        options: { xDomain: X, yDomain: set.thdY, yStep: 10, yScale: o.thdUnit === 'percent' ? 'log' : 'linear' },
        height: 260,
        highlight,
      },
      { title: 'Impedance magnitude (Ω)', series: set.impedance, options: { xDomain: X, yStep: 5 }, height: 260, highlight },
    ],
  };
}

/** The stack itself, fed by the URL (/stack) or by a saved link (/o/<code>). */
export function StackView({ entries, options: o, onEntries, onOptions, mode = 'full', title, header }: StackViewProps) {
  const wide = useBreakpoint() === 'wide';
  const band = bandOf(o);
  const { data, error, isLoading } = useOverlay(entries, band);
  const grid = data?.grid ?? emptyGrid;
  const drivers = useMemo(() => data?.drivers ?? [], [data]);
  const curves = useMemo(
    () => normaliseDrivers(grid, drivers, o),
    // eslint-disable-next-line react-hooks/exhaustive-deps -- only the options that change curves
    [grid, drivers, o.level, o.alignHz, o.smoothing, o.bandLo, o.bandHi, o.thdLevelV, o.thdUnit],
  );
  const cursor = useMemo(() => createChartCursor(), []);
  const chartSet = useStackChartSet(grid, curves, drivers, o);
  const levels = useMemo(() => thdLevels(drivers), [drivers]);
  const normalisation = describeNormalisation(o, drivers[0] ? `${drivers[0].maker.name} ${drivers[0].model}` : undefined);
  // A saved link keeps the current slugs, so a renamed driver stays in the comparison.
  const currentEntries = useMemo(
    () => entries.map((e) => {
      const d = drivers.find((x) => x.requestedSlug === e.slug || x.slug === e.slug);
      return { slug: d?.slug ?? e.slug, setId: e.setId };
    }),
    [entries, drivers],
  );

  const setSetId = useCallback((i: number, setId: number) => onEntries?.(entries.map((e, j) => (j === i ? { ...e, setId } : e))), [entries, onEntries]);
  const remove = useCallback((i: number) => onEntries?.(entries.filter((_, j) => j !== i)), [entries, onEntries]);
  const add = useCallback((slug: string) => onEntries?.([...entries, { slug, setId: null }]), [entries, onEntries]);

  const legend = chartSet.spl.filter((s) => s.label).map((s) => ({ label: s.label as string, color: s.color, dash: s.dash }));
  const png = () => pngSpec(title ?? 'Stack', chartSet, o, legend, normalisation);
  const csv = () => buildCsv(grid, curves, o.thdUnit);

  const loading = isLoading && !data;
  const errorBox = error ? (
    <Text style={styles.error} testID="stack-error">Could not load the stack: {error.message}</Text>
  ) : null;
  const charts =
    entries.length === 0 ? null : loading ? (
      <ActivityIndicator color={colors.accent} />
    ) : data ? (
      <StackCharts set={chartSet} o={o} cursor={cursor} grid={grid} curves={curves} drivers={drivers} chartHeight={wide ? 230 : 210} />
    ) : null;

  if (mode === 'embed') {
    return (
      <View style={styles.embed}>
        {errorBox}
        {charts}
        <Text style={styles.source} testID="embed-source">
          Conestack · {title ?? 'Stack'} · measured at 2.83 V / 1 m, normalisation: {normalisation}
          {drivers.length ? ` · ${drivers.map(driverLabel).join('; ')}` : ''}
        </Text>
      </View>
    );
  }

  const controls = (
    <View style={styles.column}>
      <StackSlots entries={entries} drivers={drivers} onSetChange={setSetId} onRemove={remove} />
      {onEntries ? <StackSearch entries={entries} onAdd={add} /> : null}
      {onOptions ? <StackOptionsBar o={o} onChange={onOptions} thdLevels={levels} /> : null}
      <Text style={styles.meta} testID="stack-normalisation">Levels at 2.83 V / 1 m; {normalisation}.</Text>
    </View>
  );
  const side = (
    <View style={styles.column}>
      {data ? <StackTable drivers={drivers} /> : null}
      {data ? <ExportBar png={png} csv={csv} /> : null}
      {entries.length ? <SaveForm entries={currentEntries} options={o} /> : null}
    </View>
  );

  return (
    <View style={styles.column}>
      {header}
      {entries.length === 0 ? (
        <Text style={styles.meta} testID="stack-empty">
          The stack is empty. Add up to four drivers with the search below, or with “Add to stack” on a driver’s page.
        </Text>
      ) : null}
      {errorBox}
      {wide ? (
        <View style={styles.split}>
          <View style={styles.left}>
            {controls}
            {charts}
          </View>
          <View style={styles.right}>{side}</View>
        </View>
      ) : (
        <>
          {controls}
          {charts}
          {side}
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.md },
  split: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  left: { flex: 3, minWidth: 0, gap: space.md },
  right: { flex: 2, minWidth: 0, gap: space.md },
  meta: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
  error: { fontFamily: fonts.semibold, fontSize: 14, color: colors.warn },
  embed: { padding: space.md, gap: space.md, backgroundColor: colors.paper, flex: 1 },
  source: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
});
