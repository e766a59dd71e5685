export { DriverListScreen } from './screens/driver-list-screen';
export { DriverScreen, type DriverScreenProps } from './screens/driver-screen';
export { DriverCharts } from './components/driver-charts';
export { useDriver } from './hooks/use-driver';
export { useDrivers } from './hooks/use-drivers';
export { driverHref } from './logic/driver-notes';
