"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useRef, useState } from "react";
import { ApiFailure, errorText } from "../../../../_ui/query/fetch";
import { fetchStudy, patchStudy } from "../../../../_ui/query/studies/fetchers";
import { studyKeys } from "../../../../_ui/query/studies/keys";
import type { StudyDetail } from "../../../../_ui/query/types";

export type SaveStatus = "saved" | "unsaved" | "saving" | "invalid" | "conflict" | "error";
type Phase = "idle" | "saving" | "conflict" | "error";

const DEBOUNCE_MS = 800;

/**
 * Saves the study in the background: a PATCH with the version last read, a short while after the last
 * keystroke, one at a time. A stale version (409) stops saving and keeps every edit until the user decides.
 * `body` is null while the inputs are not valid (nothing is sent then).
 */
export function useAutosave(id: string, initialVersion: number, initialBody: string, body: string | null) {
  const qc = useQueryClient();
  const version = useRef(initialVersion);
  const latest = useRef<string | null>(body);
  const failed = useRef<string | null>(null);
  const [savedBody, setSavedBody] = useState(initialBody);
  const [phase, setPhase] = useState<Phase>("idle");
  const [message, setMessage] = useState<string | null>(null);
  const [savedAt, setSavedAt] = useState<Date | null>(null);

  const derived: SaveStatus = body === null ? "invalid" : body === savedBody ? "saved" : "unsaved";
  const status: SaveStatus = phase === "idle" ? derived : phase === "error" && derived === "saved" ? "saved" : phase;

  const save = useCallback(
    async (b: string) => {
      setPhase("saving");
      try {
        const item = await patchStudy(id, { ...JSON.parse(b), version: version.current });
        version.current = item.version;
        failed.current = null;
        setSavedBody(b);
        setSavedAt(new Date());
        setMessage(null);
        setPhase("idle");
        qc.setQueryData<StudyDetail>(studyKeys.detail(id), (old) => (old ? { ...old, item } : old));
        void qc.invalidateQueries({ queryKey: studyKeys.history(id) });
        void qc.invalidateQueries({ queryKey: studyKeys.lists() });
      } catch (error) {
        if (error instanceof ApiFailure && error.status === 409 && error.code === "conflict") {
          setPhase("conflict");
          setMessage("Your edits are kept here and were not saved. Keep yours to save them over the other change, or load theirs.");
        } else {
          failed.current = b;
          setPhase("error");
          setMessage(`Not saved: ${errorText(error)} Your edits are kept; it tries again when you change something, or press “Save now”.`);
        }
      }
    },
    [id, qc],
  );

  useEffect(() => {
    latest.current = body;
    if (body === null || body === savedBody) return;
    if (phase === "saving" || phase === "conflict") return;
    if (phase === "error" && body === failed.current) return;
    const timer = setTimeout(() => void save(body), DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [body, savedBody, phase, save]);

  // Leaving with unsaved edits asks first.
  useEffect(() => {
    if (status === "saved") return;
    const guard = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      e.returnValue = "";
    };
    window.addEventListener("beforeunload", guard);
    return () => window.removeEventListener("beforeunload", guard);
  }, [status]);

  /** Keep my edits: take the newest version number and save over the other change. */
  const overwrite = useCallback(async () => {
    const fresh = await fetchStudy(id);
    version.current = fresh.item.version;
    if (latest.current) await save(latest.current);
  }, [id, save]);

  /** Drop my edits and load the other change. */
  const reloadTheirs = useCallback(async () => {
    await qc.refetchQueries({ queryKey: studyKeys.detail(id) });
  }, [id, qc]);

  const saveNow = useCallback(() => {
    if (latest.current) void save(latest.current);
  }, [save]);

  return { status, message, savedAt, overwrite, reloadTheirs, saveNow };
}
