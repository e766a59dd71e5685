import { useLocalSearchParams } from 'expo-router';
import { SavedStackScreen } from '../../features/stack';

export default function SavedStackRoute() {
  const { code } = useLocalSearchParams<{ code: string }>();
  return <SavedStackScreen code={String(Array.isArray(code) ? code[0] : code)} />;
}
