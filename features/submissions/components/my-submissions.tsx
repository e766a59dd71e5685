import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '../../ui';
import { useMySubmissions } from '../hooks/use-my-submissions';

const statusText: Record<string, string> = { pending: 'awaiting approval', approved: 'listed', rejected: 'returned' };

/** The reviewer's own submissions, newest first, with where each stands. */
export function MySubmissions() {
  const { data, error } = useMySubmissions();
  return (
    <View style={styles.wrap} testID="my-submissions">
      <Text style={styles.h2} accessibilityRole="header">
        Your submissions
      </Text>
      {error ? <Text style={styles.meta}>Your submissions could not be loaded: {error.message}</Text> : null}
      {data && data.submissions.length === 0 ? <Text style={styles.meta}>None yet.</Text> : null}
      {data?.submissions.map((s) => (
        <View key={s.id} style={styles.item} testID={`my-submission-${s.id}`}>
          {/* Until approval the set is not on the driver's page, so only approved ones link there. */}
          {s.status === 'approved' ? (
            <Link href={`/drivers/${s.driverSlug}`} style={styles.title}>
              {s.makerName} {s.model}
            </Link>
          ) : (
            <Text style={styles.title}>
              {s.makerName} {s.model}
            </Text>
          )}
          <Text style={[styles.status, s.status === 'pending' && styles.pending]}>{statusText[s.status] ?? s.status}</Text>
          <Text style={styles.meta}>
            {s.curveCount} curve{s.curveCount === 1 ? '' : 's'} · sent {new Date(s.createdAt).toLocaleDateString()}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  h2: { fontFamily: fonts.semibold, fontSize: 17, color: colors.ink },
  item: { backgroundColor: colors.card, borderWidth: 1, borderColor: colors.rule, borderRadius: radius.md, padding: space.md, gap: 2 },
  title: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  status: { fontFamily: fonts.semibold, fontSize: 13, color: colors.accent },
  pending: { color: colors.warn },
  meta: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
});
