import { NotFoundScreen } from '../features/ui';

export default function NotFound() {
  return <NotFoundScreen />;
}
