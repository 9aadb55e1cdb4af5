"use client";

import { QueryClientProvider, isServer, type QueryClient } from "@tanstack/react-query";
import type { ReactNode } from "react";
import { makeQueryClient } from "./make-client";

let browserClient: QueryClient | undefined;

/** On the server a fresh client per render; in the browser one client for the whole session. */
function getQueryClient(): QueryClient {
  if (isServer) return makeQueryClient();
  browserClient ??= makeQueryClient();
  return browserClient;
}

/** Mount inside a page's client area: gives its leaves TanStack Query. */
export function QueryProvider({ children }: { children: ReactNode }) {
  const client = getQueryClient();
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
