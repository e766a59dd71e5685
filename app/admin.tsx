import { AdminScreen } from '../features/account';

export default function AdminRoute() {
  return <AdminScreen />;
}
