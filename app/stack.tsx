import { StackScreen } from '../features/stack';

export default function StackRoute() {
  return <StackScreen />;
}
