import { Stack } from 'expo-router';
import { AppProviders } from '../features/ui';

export default function RootLayout() {
  return (
    <AppProviders>
      <Stack screenOptions={{ headerShown: false }} />
    </AppProviders>
  );
}
