export { DriverListScreen } from './screens/driver-list-screen';
export { DriverScreen } from './screens/driver-screen';
export { useDriver } from './hooks/use-driver';
export { useDrivers } from './hooks/use-drivers';
