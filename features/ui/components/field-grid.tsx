import { createContext, useContext, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '../theme';

// Fields share a row's width only inside a grid; elsewhere a field is a plain block, so a lone
// field in a column takes the column's width instead of growing tall.
const InFieldGrid = createContext(false);

export function useInFieldGrid(): boolean {
  return useContext(InFieldGrid);
}

export function FieldGrid({ children }: { children: ReactNode }) {
  return (
    <InFieldGrid.Provider value>
      <View style={styles.grid}>{children}</View>
    </InFieldGrid.Provider>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
