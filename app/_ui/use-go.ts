"use client";

import { useRouter } from "next/navigation";
import { useCallback } from "react";

/** Navigates after the session changed (sign-in, sign-out, shop switch): the server renders afresh. */
export function useGo() {
  const router = useRouter();
  return useCallback(
    (path: string) => {
      router.replace(path);
      router.refresh();
    },
    [router],
  );
}
