"use client";

import { type ComponentType, lazy } from "react";

// A heavy interactive part of a page (an editor, the studio) is rendered on the server like the rest, so its
// HTML paints with the first paint. Its code is a script of its own rather than part of the page's first
// scripts: the browser fetches it alongside them, as soon as the page's own code runs, and runs it in a task
// of its own, so no single task has to start the framework and the studio at once. The page comes alive once
// that code is there (before the load event), on the server's elements: nothing is drawn twice and nothing
// moves, and a click after the load event is never lost.

type Thenable<T> = { then(resolve: (value: T) => void, reject: (error: unknown) => void): void };

/**
 * A component whose code loads as a script of its own, the fetch starting at once. Render it as it is (no
 * Suspense boundary of its own, so the server sends its HTML in place rather than streaming it after the
 * page); once the code is there it renders synchronously (a thenable that answers at once).
 */
export function later<P extends object>(load: () => Promise<ComponentType<P>>) {
  let loaded: ComponentType<P> | null = null;
  const loading = load().then((component) => (loaded = component));
  return lazy<ComponentType<P>>(() => {
    const ready: Thenable<{ default: ComponentType<P> }> | null = loaded ? { then: (resolve) => resolve({ default: loaded as ComponentType<P> }) } : null;
    return (ready ?? loading.then((component) => ({ default: component }))) as Promise<{ default: ComponentType<P> }>;
  });
}
