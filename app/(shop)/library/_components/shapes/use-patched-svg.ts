"use client";

import morphdom from "morphdom";
import { useLayoutEffect, useRef, useState, type RefObject } from "react";

/** What matches an element of the drawing with its counterpart in the next one: its shape or point and its part. */
const nodeKey = (node: Node) => {
  const key = node instanceof Element ? node.getAttribute("data-key") : null;
  return key ? `${node.nodeName}|${(node as Element).getAttribute("data-kind") ?? ""}|${key}` : undefined;
};

/**
 * Shows the SVG markup `svg` in `host`: React writes the first drawing only (pass the result as the host's
 * `dangerouslySetInnerHTML`); every later one is patched into it in place, so the element under the pointer
 * stays on the page. Chromium drops the pointer's next events, a press included, when the element they were
 * aimed at is replaced while they are dispatched: a hover that redrew the plan would swallow the click or drag
 * that follows it. After each patch the view box is set again, and the point with the key in `focusKey` gets
 * the focus back if the patch replaced it while it had it.
 */
export function usePatchedSvg(host: RefObject<HTMLElement | null>, svg: string, viewBox: string, focusKey: RefObject<string | null>) {
  const [first] = useState(() => ({ __html: svg }));
  const shown = useRef(first.__html);
  useLayoutEffect(() => {
    const el = host.current?.querySelector("svg");
    if (!el || shown.current === svg) return;
    morphdom(el, svg, { getNodeKey: nodeKey });
    shown.current = svg;
  }, [host, svg]);
  useLayoutEffect(() => {
    host.current?.querySelector("svg")?.setAttribute("viewBox", viewBox);
  }, [host, svg, viewBox]);
  useLayoutEffect(() => {
    const key = focusKey.current;
    const active = document.activeElement;
    if (!key || (active && active !== document.body && !host.current?.contains(active))) return;
    const el = host.current?.querySelector<SVGElement>(`[data-key="${CSS.escape(key)}"]`);
    if (el && el !== active) el.focus({ preventScroll: true });
  }, [host, svg, focusKey]);
  return first;
}
