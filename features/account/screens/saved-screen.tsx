import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import useSWR from 'swr';
import { colors, fonts, radius, ScreenFrame, space } from '../../ui';
import { RequireRole } from '../components/require-role';

interface SavedItem {
  code: string;
  title: string;
  note: string;
  createdAt: string;
}

function SavedList() {
  const { data } = useSWR<{ overlays: SavedItem[] }>('/api/me/overlays');
  if (!data) return null;
  if (data.overlays.length === 0) return <Text style={styles.meta}>No saved comparisons yet. Save one from the stack screen.</Text>;
  return (
    <View style={styles.list} testID="saved-list">
      {data.overlays.map((o) => (
        <Link key={o.code} href={`/o/${o.code}`} style={styles.item} testID={`saved-${o.code}`}>
          <Text style={styles.title}>{o.title}</Text>
          {o.note ? <Text style={styles.meta}> — {o.note}</Text> : null}
          <Text style={styles.code}>  /o/{o.code}</Text>
        </Link>
      ))}
    </View>
  );
}

export function SavedScreen() {
  return (
    <ScreenFrame testID="saved-screen">
      <Text style={styles.h1} accessibilityRole="header">
        My comparisons
      </Text>
      <RequireRole role="member">
        <SavedList />
      </RequireRole>
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  list: { gap: space.sm },
  item: { backgroundColor: colors.card, borderWidth: 1, borderColor: colors.rule, borderRadius: radius.md, padding: space.md },
  title: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  meta: { fontFamily: fonts.regular, fontSize: 14, color: colors.inkSoft },
  code: { fontFamily: fonts.regular, fontSize: 13, color: colors.accent },
});
