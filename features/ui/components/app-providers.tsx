import { useFonts } from 'expo-font';
import { createContext, useContext, type ComponentType, type ReactNode } from 'react';
import { ActivityIndicator, View } from 'react-native';
import { SWRConfig } from 'swr';
import { fetchJson } from '../api/fetch-json';
import { colors, fontFiles } from '../theme';

// The top bar shows account controls that live in another feature; passing the component in
// keeps features/ui free of imports from the features built on it.
const BarAccessoryContext = createContext<ComponentType | null>(null);

export function useBarAccessory(): ComponentType | null {
  return useContext(BarAccessoryContext);
}

/** Fonts and data-fetching defaults for every screen. */
export function AppProviders({ children, barAccessory = null }: { children: ReactNode; barAccessory?: ComponentType | null }) {
  const [loaded, error] = useFonts(fontFiles);
  if (!loaded && !error) {
    return (
      <View style={{ flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.paper }}>
        <ActivityIndicator color={colors.accent} />
      </View>
    );
  }
  return (
    <BarAccessoryContext.Provider value={barAccessory}>
      <SWRConfig value={{ fetcher: fetchJson, revalidateOnFocus: false }}>{children}</SWRConfig>
    </BarAccessoryContext.Provider>
  );
}
