import { useLocalSearchParams } from 'expo-router';
import { DriverScreen } from '../../features/drivers';

export default function DriverRoute() {
  const { slug } = useLocalSearchParams<{ slug: string }>();
  return <DriverScreen slug={String(slug)} />;
}
