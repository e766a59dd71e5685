import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '../../ui';
import { signInHref, signOut } from '../api/account-api';
import { useMe } from '../hooks/use-me';
import { currentPath, goTo } from './go-to';

/** Sign-in state in the top bar, with the actions the role allows. */
export function AccountMenu() {
  const { user, isLoading, can, refresh } = useMe();
  if (isLoading) return null;
  if (!user) {
    return (
      <Text style={styles.link} accessibilityRole="link" testID="sign-in" onPress={() => goTo(signInHref(currentPath()))}>
        Sign in
      </Text>
    );
  }
  return (
    <View style={styles.row} testID="account-menu">
      <Text style={styles.name} testID="account-name">
        {user.displayName}
      </Text>
      <Text style={styles.role} testID="account-role">
        {user.role}
      </Text>
      <Link href="/saved" style={styles.link} testID="saved-link-menu">
        My comparisons
      </Link>
      {can('reviewer') ? (
        <Link href="/submit" style={styles.link} testID="submit-link">
          Submit measurements
        </Link>
      ) : null}
      {can('admin') ? (
        <Link href="/admin" style={styles.link} testID="admin-link">
          Roles
        </Link>
      ) : null}
      <Text
        style={styles.link}
        accessibilityRole="button"
        testID="sign-out"
        onPress={() => {
          void signOut().then(() => refresh(null, { revalidate: false }));
        }}
      >
        Sign out
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'baseline', gap: space.sm, flexWrap: 'wrap' },
  name: { color: colors.paper, fontFamily: fonts.semibold, fontSize: 13 },
  role: { color: colors.ink, backgroundColor: '#5eead4', fontFamily: fonts.semibold, fontSize: 11, paddingHorizontal: 6, borderRadius: radius.sm },
  link: { color: '#b9f3ea', fontFamily: fonts.semibold, fontSize: 13, textDecorationLine: 'underline' },
});
