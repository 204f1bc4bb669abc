// @ts-nocheck
// Tests import server modules directly; the real "server-only" guard throws outside React Server Components.
export {};
