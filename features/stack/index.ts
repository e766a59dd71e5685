export { useStackSelection, type StackSelection } from './use-stack-selection';
export { STACK_KEY, STACK_MAX } from './stack-store';
