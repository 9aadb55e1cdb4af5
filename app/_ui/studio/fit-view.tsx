"use client";

import dynamic from "next/dynamic";
import { memo } from "react";

// three.js and react-three-fiber load only here, in the browser, so other pages carry none of it.
export const FitView = memo(
  dynamic(() => import("@/scene/three/fit-canvas"), {
    ssr: false,
    loading: () => <div className="grid h-full place-items-center text-sm text-ink-2">Loading the 3D view…</div>,
  }),
);
