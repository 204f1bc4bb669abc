// @ts-nocheck
"use client";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState } from "react";

/**
 * Client-side data fetching for the pages that page and search through the API (combinations,
 * shelf, recommendations). Each of those pages wraps its list in one, so the query library stays
 * out of the pages that never fetch from the browser (the planner, home, lessons): about 8 kB of
 * gzip JavaScript on each of them.
 */
export function QueryProvider({ children }: { children: React.ReactNode }) {
  const [client] = useState(
    () => new QueryClient({ defaultOptions: { queries: { staleTime: 10_000, retry: 1, refetchOnWindowFocus: false } } }),
  );
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
