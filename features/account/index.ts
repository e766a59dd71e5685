export { AccountMenu } from './components/account-menu';
export { RequireRole } from './components/require-role';
export { useMe } from './hooks/use-me';
export { signInHref } from './api/account-api';
export { AdminScreen } from './screens/admin-screen';
export { SignInScreen } from './screens/signin-screen';
export { SavedScreen } from './screens/saved-screen';
