import { expect } from "vitest";

/** The error of class `kind` that `f` throws; the test fails if it throws anything else or nothing. */
export function thrown<E extends Error>(kind: abstract new (...args: never[]) => E, f: () => unknown): E {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(kind);
    return e as E;
  }
  return expect.unreachable(`expected a ${kind.name}`);
}
