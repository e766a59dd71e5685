import { SavedScreen } from '../features/account';

export default function SavedRoute() {
  return <SavedScreen />;
}
