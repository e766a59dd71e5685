import { useLocalSearchParams } from 'expo-router';
import { DriverScreen } from '../../features/drivers';

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default function DriverRoute() {
  const { slug, bandLo, bandHi } = useLocalSearchParams<{ slug: string; bandLo?: string; bandHi?: string }>();
  return <DriverScreen slug={String(one(slug))} bandLo={one(bandLo)} bandHi={one(bandHi)} />;
}
