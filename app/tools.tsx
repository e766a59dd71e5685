import { ToolsScreen } from '../features/tools';

export default function Tools() {
  return <ToolsScreen />;
}
