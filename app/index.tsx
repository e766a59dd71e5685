import { DriverListScreen } from '../features/drivers';

export default function Index() {
  return <DriverListScreen />;
}
