import { Stack } from 'expo-router';
import { AccountMenu } from '../features/account';
import { AppProviders } from '../features/ui';

export default function RootLayout() {
  return (
    <AppProviders barAccessory={AccountMenu}>
      <Stack screenOptions={{ headerShown: false }} />
    </AppProviders>
  );
}
