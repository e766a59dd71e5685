export { ToolsScreen } from './screens/tools-screen';
export { useCalc } from './hooks/use-calc';
export { postCalc } from './api/calc-api';
