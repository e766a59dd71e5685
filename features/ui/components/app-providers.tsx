import { useFonts } from 'expo-font';
import type { ReactNode } from 'react';
import { ActivityIndicator, View } from 'react-native';
import { SWRConfig } from 'swr';
import { fetchJson } from '../api/fetch-json';
import { colors, fontFiles } from '../theme';

/** Fonts and data-fetching defaults for every screen. */
export function AppProviders({ children }: { children: ReactNode }) {
  const [loaded, error] = useFonts(fontFiles);
  if (!loaded && !error) {
    return (
      <View style={{ flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.paper }}>
        <ActivityIndicator color={colors.accent} />
      </View>
    );
  }
  return <SWRConfig value={{ fetcher: fetchJson, revalidateOnFocus: false }}>{children}</SWRConfig>;
}
