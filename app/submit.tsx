import { SubmitScreen } from '../features/submissions';

export default function SubmitRoute() {
  return <SubmitScreen />;
}
