import { useEffect, type ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, Text } from 'react-native';
import type { Role } from '../../../shared/schemas/users';
import { colors, fonts } from '../../ui';
import { signInHref } from '../api/account-api';
import { useMe } from '../hooks/use-me';
import { currentPath, goTo } from './go-to';

/** Shows children to `role` and above; sends a visitor to sign in and back here. */
export function RequireRole({ role, children }: { role: Role; children: ReactNode }) {
  const { user, isLoading, can } = useMe();
  useEffect(() => {
    if (!isLoading && !user) goTo(signInHref(currentPath()));
  }, [isLoading, user]);
  if (isLoading || !user) return <ActivityIndicator color={colors.accent} />;
  if (!can(role)) return <Text style={styles.denied}>This page is for the {role} role; you are signed in as a {user.role}.</Text>;
  return <>{children}</>;
}

const styles = StyleSheet.create({ denied: { fontFamily: fonts.semibold, color: colors.warn, fontSize: 15 } });
