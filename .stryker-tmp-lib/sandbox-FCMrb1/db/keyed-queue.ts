// @ts-nocheck
// Runs tasks with the same key one after another within this process. Work that then waits on a
// PostgreSQL advisory lock (which holds a pooled connection while it waits) queues here instead,
// so a burst on one key takes one connection, not the whole pool. The advisory lock still orders
// work across processes and instances.
const tails = new Map<string, Promise<unknown>>();

export async function inKeyOrder<T>(keys: string[], fn: () => Promise<T>): Promise<T> {
  const [key, ...rest] = keys;
  if (key === undefined) return fn();
  const before = tails.get(key) ?? Promise.resolve();
  const run = before.catch(() => {}).then(() => inKeyOrder(rest, fn));
  const tail = run.catch(() => {});
  tails.set(key, tail);
  try {
    return await run;
  } finally {
    if (tails.get(key) === tail) tails.delete(key);
  }
}
