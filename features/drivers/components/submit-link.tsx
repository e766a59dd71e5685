import { Link } from 'expo-router';
import { StyleSheet, Text } from 'react-native';
import { useMe } from '../../account';
import { colors, fonts } from '../../ui';

/** For reviewers: start a submission already pointed at this driver. */
export function SubmitLink({ slug }: { slug: string }) {
  const { can } = useMe();
  if (!can('reviewer')) return null;
  return (
    <Link href={`/submit?driver=${encodeURIComponent(slug)}`} style={styles.link} testID="driver-submit-link">
      <Text>Add your measurements of this driver</Text>
    </Link>
  );
}

const styles = StyleSheet.create({ link: { fontFamily: fonts.semibold, fontSize: 14, color: colors.accent, textDecorationLine: 'underline' } });
