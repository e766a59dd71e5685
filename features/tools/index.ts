export { ToolsScreen } from './screens/tools-screen';
export { useCalc } from './hooks/use-calc';
export { postCalc } from './api/calc-api';
export { fillParameterFields, ParameterCompletion, useParameterFields, type ParameterFieldKey, type ParameterFields } from './components/parameter-completion';
export { displayUnits, toDisplay, formatNumber, type DisplayUnit } from './components/display-units';
export { useNumberFields, type FieldSpec, type NumberFields } from './hooks/use-number-fields';
