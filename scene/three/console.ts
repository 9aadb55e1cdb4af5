import { getConsoleFunction, setConsoleFunction } from "three";

// @react-three/fiber 9 still builds a THREE.Clock for its frame loop, and three r183 deprecated Clock in
// favour of THREE.Timer, so every canvas printed a deprecation warning that is not ours to fix (the
// fiber's next major moves to Timer). Through three's own console hook, that one message is dropped;
// every other message of three.js goes to the console as before.

const CLOCK_DEPRECATED = /^THREE\.Clock: This module has been deprecated/;

/** Routes three.js's console output through a filter that drops the fiber's Clock deprecation notice (once per page). */
export function quietClockDeprecation(): void {
  const previous = getConsoleFunction();
  if (previous && (previous as { quietsClock?: boolean }).quietsClock) return;
  const fn = Object.assign(
    (type: "log" | "warn" | "error", message: string, ...params: unknown[]) => {
      if (type === "warn" && CLOCK_DEPRECATED.test(message)) return;
      if (previous) previous(type, message, ...params);
      else console[type](message, ...params);
    },
    { quietsClock: true },
  );
  setConsoleFunction(fn);
}
