export { SubmitScreen } from './screens/submit-screen';
