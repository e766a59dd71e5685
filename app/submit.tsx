import { useLocalSearchParams } from 'expo-router';
import { SubmitScreen } from '../features/submissions';

export default function SubmitRoute() {
  const { driver } = useLocalSearchParams<{ driver?: string }>();
  return <SubmitScreen driverSlug={Array.isArray(driver) ? driver[0] : driver} />;
}
