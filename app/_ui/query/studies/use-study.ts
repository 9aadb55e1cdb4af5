"use client";

import { useQuery } from "@tanstack/react-query";
import { fetchStudy, fetchStudyHistory } from "./fetchers";
import { studyKeys } from "./keys";

/** A study's row and the assembled core Study. */
export function useStudy(id: string) {
  return useQuery({ queryKey: studyKeys.detail(id), queryFn: () => fetchStudy(id), staleTime: Infinity });
}

/** Who changed what on a study, newest first. */
export function useStudyHistory(id: string) {
  return useQuery({ queryKey: studyKeys.history(id), queryFn: () => fetchStudyHistory(id) });
}
