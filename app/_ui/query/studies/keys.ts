import type { ListParams } from "../types";

/** Query keys of studies: a save invalidates `detail(id)`'s history; a create, duplicate or import invalidates `lists()`. */
export const studyKeys = {
  all: ["studies"] as const,
  lists: () => [...studyKeys.all, "list"] as const,
  list: (params: ListParams) => [...studyKeys.lists(), params] as const,
  details: () => [...studyKeys.all, "detail"] as const,
  detail: (id: string) => [...studyKeys.details(), id] as const,
  history: (id: string) => [...studyKeys.detail(id), "history"] as const,
};
