import { StyleSheet, Text, View } from 'react-native';
import type { RoleFit } from '../../../shared/schemas/drivers';
import { colors, fonts, radius, space } from '../../ui';
import { roleDisplay } from '../logic/driver-notes';

/** A ranked card's place, score, the figures behind the score and the server's reasons. */
export function RoleFitBlock({ role, testID }: { role: RoleFit; testID?: string }) {
  const d = roleDisplay(role);
  return (
    <View style={styles.block} testID={testID}>
      <View style={styles.head}>
        <Text style={styles.rank} accessibilityLabel={`Rank ${role.rank}`}>{d.rank}</Text>
        <Text style={styles.score}>fit score {d.score}</Text>
      </View>
      {d.figures.length > 0 ? (
        <View style={styles.figures}>
          {d.figures.map((f) => (
            <Text key={f.label} style={styles.figure}>
              <Text style={styles.figureLabel}>{f.label} </Text>
              {f.value}
            </Text>
          ))}
        </View>
      ) : null}
      {d.reasons.map((r, i) => (
        <Text key={i} style={styles.reason}>
          · {r}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { backgroundColor: colors.accentSoft, borderRadius: radius.sm, padding: space.sm, gap: 2, marginTop: space.xs },
  head: { flexDirection: 'row', alignItems: 'baseline', gap: space.sm },
  rank: { fontFamily: fonts.bold, fontSize: 18, color: colors.accent },
  score: { fontFamily: fonts.semibold, fontSize: 12, color: colors.ink },
  figures: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md },
  figure: { fontFamily: fonts.regular, fontSize: 12, color: colors.ink, fontVariant: ['tabular-nums'] },
  figureLabel: { color: colors.inkSoft },
  reason: { fontFamily: fonts.regular, fontSize: 12, color: colors.ink },
});
