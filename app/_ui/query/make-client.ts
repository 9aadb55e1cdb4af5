import { QueryClient, defaultShouldDehydrateQuery } from "@tanstack/react-query";

/** A QueryClient with the product's defaults: short staleness, no retry on a 4xx, pending queries dehydrated. */
export function makeQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (count, error) => {
          const status = (error as { status?: number }).status ?? 0;
          return status === 0 || status >= 500 ? count < 2 : false;
        },
        refetchOnWindowFocus: false,
      },
      dehydrate: {
        shouldDehydrateQuery: (query) => defaultShouldDehydrateQuery(query) || query.state.status === "pending",
      },
    },
  });
}
