"use client";

import { type ComponentType, lazy } from "react";

// A heavy interactive part of a page (an editor, the studio) is rendered on the server like the rest, so its
// HTML paints with the first paint; in the browser its code loads, and its HTML comes alive, only once the page
// has loaded and gone idle, or at the visitor's first touch, key or scroll, whichever comes first. Until then
// React leaves the server's HTML in place (a Suspense boundary still waiting to hydrate), so nothing moves.

/** The longest wait for an idle moment after the load event. */
const IDLE_TIMEOUT_MS = 2000;
const FIRST_INPUT = ["pointerdown", "keydown", "focusin", "wheel", "touchstart", "scroll"] as const;

let ready: Promise<void> | null = null;

/** Resolves once the page has loaded and the main thread is idle, or at the first input; at once on the server. */
export function pageSettled(): Promise<void> {
  if (typeof window === "undefined") return Promise.resolve();
  ready ??= new Promise<void>((resolve) => {
    const done = () => {
      for (const type of FIRST_INPUT) window.removeEventListener(type, done, true);
      resolve();
    };
    for (const type of FIRST_INPUT) window.addEventListener(type, done, { capture: true, passive: true });
    const idle = () => (typeof window.requestIdleCallback === "function" ? window.requestIdleCallback(done, { timeout: IDLE_TIMEOUT_MS }) : window.setTimeout(done, 200));
    if (document.readyState === "complete") idle();
    else window.addEventListener("load", idle, { once: true });
  });
  return ready;
}

/**
 * A component whose code is fetched once the page has settled (see pageSettled); render it inside a
 * Suspense boundary. On the server it renders at once, so its HTML is in the first answer.
 */
export function later<P extends object>(load: () => Promise<ComponentType<P>>) {
  return lazy(() => pageSettled().then(load).then((component) => ({ default: component })));
}
