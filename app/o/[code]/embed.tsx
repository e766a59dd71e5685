import { useLocalSearchParams } from 'expo-router';
import { EmbedStackScreen } from '../../../features/stack';

export default function EmbedStackRoute() {
  const { code } = useLocalSearchParams<{ code: string }>();
  return <EmbedStackScreen code={String(Array.isArray(code) ? code[0] : code)} />;
}
