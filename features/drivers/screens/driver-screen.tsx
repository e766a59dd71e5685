import { useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { ApiRequestError, colors, fonts, radius, ScreenFrame, SectionTitle, space, useBreakpoint } from '../../ui';
import { DriverCharts } from '../components/driver-charts';
import { CautionsBlock, DriverInfo, MethodBlock, SetPicker, SpreadTable, setSummary } from '../components/driver-facts';
import { FiguresPanel } from '../components/figures-panel';
import { ParameterComparison } from '../components/parameter-comparison';
import { StackButton } from '../components/stack-button';
import { SubmitLink } from '../components/submit-link';
import { useAliasRedirect } from '../hooks/use-alias-redirect';
import { useDriver } from '../hooks/use-driver';
import { takeRedirectNote } from '../logic/driver-notes';

export interface DriverScreenProps {
  slug: string;
  /** A role band from the URL; the server derives the figures over it. */
  bandLo?: string;
  bandHi?: string;
}

export function DriverScreen({ slug, bandLo, bandHi }: DriverScreenProps) {
  const band = useMemo(() => (bandLo && bandHi ? { bandLo, bandHi } : {}), [bandLo, bandHi]);
  const { data, error, isLoading } = useDriver(slug, band);
  const router = useRouter();
  useAliasRedirect(data, band, (href) => router.replace(href));
  const wide = useBreakpoint() === 'wide';
  const [setId, setSetId] = useState<number | undefined>(undefined);
  const [formerly] = useState(() => takeRedirectNote(slug));

  if (error) {
    const missing = error instanceof ApiRequestError && error.status === 404;
    return (
      <ScreenFrame testID="driver-screen">
        <Text style={styles.h1}>{missing ? 'Driver not found' : 'Could not load this driver'}</Text>
        <Text style={styles.meta} testID="driver-error">{missing ? `No driver is listed as “${slug}”.` : error.message}</Text>
      </ScreenFrame>
    );
  }
  if (isLoading || !data) {
    return (
      <ScreenFrame testID="driver-screen">
        <ActivityIndicator color={colors.accent} />
      </ScreenFrame>
    );
  }
  const sets = data.measurementSets;
  const set = sets.find((s) => s.id === setId) ?? sets[0];
  const figures = set ? data.figures.find((f) => f.setId === set.id) : undefined;
  const oldName = formerly ?? (data.requestedSlug !== data.slug ? data.requestedSlug : null);

  const charts = (
    <View style={styles.column}>
      <SetPicker sets={sets} selectedId={set?.id} onSelect={setSetId} />
      {set ? <Text style={styles.meta} testID="selected-set">Showing {set.label}: {setSummary(set)}</Text> : null}
      <DriverCharts set={set} sets={sets} />
    </View>
  );
  const tables = (
    <View style={styles.column}>
      <SectionTitle>Small-signal parameters</SectionTitle>
      <ParameterComparison parameters={set?.parameters ?? []} specs={data.makerSpecs} signal="small" testID="params-small" />
      <SectionTitle>Large-signal parameters</SectionTitle>
      <ParameterComparison parameters={set?.parameters ?? []} specs={data.makerSpecs} signal="large" testID="params-large" />
      <Text style={styles.note}>Maker figures beside the measured ones; a difference beyond ±10 % is marked.</Text>
      <SpreadTable spread={data.spread} />
      <FiguresPanel figures={figures} bandFromUrl={Boolean(band.bandLo)} />
      <MethodBlock set={set} />
      <DriverInfo driver={data} />
    </View>
  );

  return (
    <ScreenFrame testID="driver-screen">
      <View style={styles.header}>
        <Text style={styles.maker}>{data.maker.name}</Text>
        <Text style={styles.h1} accessibilityRole="header">{data.model}</Text>
        <Text style={styles.meta}>
          {data.nominalSizeIn}″ {data.type} · {data.nominalImpedanceOhm} Ω nominal
          {data.sensitivityDb != null ? ` · ${data.sensitivityDb.toFixed(1)} dB at 2.83 V / 1 m` : ''}
        </Text>
        {oldName ? (
          <Text style={styles.formerly} testID="formerly-note">
            Formerly listed as “{oldName}”; this is its current page.
          </Text>
        ) : null}
        <StackButton slug={data.slug} />
        <SubmitLink slug={data.slug} />
      </View>
      <CautionsBlock driver={data} />
      {wide ? (
        <View style={styles.split}>
          <View style={styles.chartsWide}>{charts}</View>
          <View style={styles.tablesWide}>{tables}</View>
        </View>
      ) : (
        <>
          {charts}
          {tables}
        </>
      )}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  header: { gap: 4 },
  maker: { fontFamily: fonts.semibold, fontSize: 13, color: colors.inkSoft, textTransform: 'uppercase', letterSpacing: 0.8 },
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  meta: { fontFamily: fonts.regular, fontSize: 14, color: colors.inkSoft },
  note: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
  formerly: {
    alignSelf: 'flex-start', fontFamily: fonts.regular, fontSize: 13, color: colors.ink, backgroundColor: colors.accentSoft,
    paddingHorizontal: space.sm, paddingVertical: 4, borderRadius: radius.sm,
  },
  split: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  chartsWide: { flex: 3, minWidth: 0 },
  tablesWide: { flex: 2, minWidth: 0 },
  column: { gap: space.md },
});
