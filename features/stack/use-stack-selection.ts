import { useCallback, useSyncExternalStore } from 'react';
import { addToStack, readStack, removeFromStack, STACK_MAX, subscribeStack, writeStack } from './stack-store';

const emptyServerSnapshot: string[] = [];

export interface StackSelection {
  list: readonly string[];
  count: number;
  max: number;
  full: boolean;
  has: (slug: string) => boolean;
  /** False when the slug was already there or the stack is full. */
  add: (slug: string) => boolean;
  remove: (slug: string) => void;
  clear: () => void;
}

/** The drivers picked for comparison, shared by every component through localStorage. */
export function useStackSelection(): StackSelection {
  const list = useSyncExternalStore(subscribeStack, readStack, () => emptyServerSnapshot);
  const add = useCallback((slug: string) => {
    const r = addToStack(readStack(), slug);
    if (r.added) writeStack(r.list);
    return r.added;
  }, []);
  const remove = useCallback((slug: string) => writeStack(removeFromStack(readStack(), slug)), []);
  const clear = useCallback(() => writeStack([]), []);
  const has = useCallback((slug: string) => list.includes(slug), [list]);
  return { list, count: list.length, max: STACK_MAX, full: list.length >= STACK_MAX, has, add, remove, clear };
}
