/**
 * Work to run after any write has committed in this process (e.g. dropping cached answers that
 * the write may have changed). Listeners must be quick and must not throw.
 */
const listeners = new Set<() => void>();

export function onWriteCommitted(listener: () => void) {
  listeners.add(listener);
}

export function writeCommitted() {
  for (const listener of listeners) listener();
}
