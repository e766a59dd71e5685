import { readFileSync } from 'node:fs';

/** Whether `pid` is a running process; one that ended but was not reaped yet counts as gone. */
export function processAlive(pid) {
  try {
    process.kill(pid, 0);
  } catch {
    return false;
  }
  // An orphan's new parent may never reap it, and a zombie still answers kill(0).
  try {
    return !/^\d+ \(.*\) Z/.test(readFileSync(`/proc/${pid}/stat`, 'utf8'));
  } catch {
    return false;
  }
}
