import { SignInScreen } from '../features/account';

export default function SignInRoute() {
  return <SignInScreen />;
}
