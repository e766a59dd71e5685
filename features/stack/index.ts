export { useStackSelection, type StackSelection } from './use-stack-selection';
export { STACK_KEY, STACK_MAX } from './stack-store';
export { StackScreen } from './screens/stack-screen';
export { SavedStackScreen, EmbedStackScreen } from './screens/saved-stack-screen';
