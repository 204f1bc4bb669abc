// @ts-nocheck
// No imports: the server's PDF renderer, the tests and the benchmarks all start Chromium this way.

/** Flags for Debian's Chromium on a closed network (no background calls home), shared with the browser tests. */
export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];
