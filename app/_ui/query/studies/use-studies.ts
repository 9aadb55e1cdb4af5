"use client";

import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { errorText } from "../fetch";
import type { ListParams, Page, StudyRow } from "../types";
import { createStudy, duplicateStudy, fetchStudies, importStudy, setStudyArchived, type StudyCreate } from "./fetchers";
import { studyKeys } from "./keys";

/** One page of the studies table. */
export function useStudies(params: ListParams) {
  return useQuery({ queryKey: studyKeys.list(params), queryFn: () => fetchStudies(params), placeholderData: keepPreviousData });
}

/** Create, duplicate, import (refetch the lists after) and archive/restore (optimistic, rolled back with a message). */
export function useStudyActions(onProblem: (text: string) => void) {
  const qc = useQueryClient();
  const invalidate = () => qc.invalidateQueries({ queryKey: studyKeys.lists() });

  const create = useMutation({ mutationFn: (body: StudyCreate) => createStudy(body), onSuccess: invalidate });
  const duplicate = useMutation({ mutationFn: (id: string) => duplicateStudy(id), onSuccess: invalidate, onError: (e) => onProblem(errorText(e)) });
  const importFile = useMutation({ mutationFn: (study: unknown) => importStudy(study), onSuccess: invalidate });

  const archive = useMutation({
    mutationFn: ({ id, archived }: { id: string; archived: boolean }) => setStudyArchived(id, archived),
    onMutate: async ({ id }) => {
      await qc.cancelQueries({ queryKey: studyKeys.lists() });
      const snapshot = qc.getQueriesData<Page<StudyRow>>({ queryKey: studyKeys.lists() });
      for (const [key, page] of snapshot) {
        if (page) qc.setQueryData(key, { ...page, items: page.items.filter((s) => s.id !== id), total: Math.max(0, page.total - 1) });
      }
      return snapshot;
    },
    onError: (error, _v, snapshot) => {
      for (const [key, page] of snapshot ?? []) qc.setQueryData(key, page);
      onProblem(errorText(error));
    },
    onSettled: (_d, _e, { id }) => {
      void invalidate();
      void qc.invalidateQueries({ queryKey: studyKeys.detail(id) });
    },
  });

  return { create, duplicate, importFile, archive };
}
