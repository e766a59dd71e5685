import { SubmitScreen } from '../features/account';

export default function SubmitRoute() {
  return <SubmitScreen />;
}
