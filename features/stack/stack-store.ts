// The comparison stack: up to four driver slugs, kept in localStorage so the selection survives
// reloads and is shared by every screen that shows it. Pure list rules sit apart from storage.
export const STACK_KEY = 'conestack.stack';
export const STACK_MAX = 4;
/** Fired on window after every write, for the page chrome's count (ui cannot import this feature). */
export const STACK_EVENT = 'conestack:stack';

const slugPattern = /^[a-z0-9-]{1,160}$/;

/** Reads whatever is stored, keeping only valid, distinct slugs up to the limit. */
export function parseStack(raw: string | null): string[] {
  if (!raw) return [];
  try {
    const v: unknown = JSON.parse(raw);
    if (!Array.isArray(v)) return [];
    const out: string[] = [];
    for (const s of v) if (typeof s === 'string' && slugPattern.test(s) && !out.includes(s)) out.push(s);
    return out.slice(0, STACK_MAX);
  } catch {
    return [];
  }
}

export function addToStack(list: readonly string[], slug: string): { list: string[]; added: boolean } {
  if (list.includes(slug)) return { list: [...list], added: false };
  if (list.length >= STACK_MAX) return { list: [...list], added: false };
  return { list: [...list, slug], added: true };
}

export function removeFromStack(list: readonly string[], slug: string): string[] {
  return list.filter((s) => s !== slug);
}

type Listener = () => void;
const listeners = new Set<Listener>();
let cache: { raw: string | null; list: string[] } = { raw: null, list: [] };

function storage(): Storage | null {
  try {
    return typeof window !== 'undefined' && window.localStorage ? window.localStorage : null;
  } catch {
    // Private modes can refuse storage; the stack then lives for this page only.
    return null;
  }
}

let memory: string | null = null;

function readRaw(): string | null {
  const s = storage();
  return s ? s.getItem(STACK_KEY) : memory;
}

/** A stable array per stored value, as useSyncExternalStore needs. */
export function readStack(): string[] {
  const raw = readRaw();
  if (raw !== cache.raw) cache = { raw, list: parseStack(raw) };
  return cache.list;
}

export function writeStack(list: readonly string[]): void {
  const raw = JSON.stringify(list);
  const s = storage();
  if (s) s.setItem(STACK_KEY, raw);
  else memory = raw;
  listeners.forEach((l) => l());
  if (typeof window !== 'undefined' && typeof window.dispatchEvent === 'function') window.dispatchEvent(new Event(STACK_EVENT));
}

export function subscribeStack(listener: Listener): () => void {
  listeners.add(listener);
  // Another tab changing the stack shows up here too.
  const onStorage = (e: StorageEvent) => {
    if (e.key === STACK_KEY) listener();
  };
  if (typeof window !== 'undefined') window.addEventListener('storage', onStorage);
  return () => {
    listeners.delete(listener);
    if (typeof window !== 'undefined') window.removeEventListener('storage', onStorage);
  };
}
