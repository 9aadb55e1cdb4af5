// Runs in the browser before the app's own code. zod probes whether it may compile validators with
// `new Function`; under the content security policy (no 'unsafe-eval') the probe is reported as a violation
// even though zod falls back. Skip the probe: validation works the same without it.
// zod keeps its settings on one global object, which it creates when it first loads unless it is there
// already (zod/v4/core/core.js). Setting the flag on that object here, rather than through zod's `config()`,
// keeps zod itself out of the scripts every page loads; the validators load with the pages that use them.
const holder = globalThis as { __zod_globalConfig?: { jitless?: boolean } };
(holder.__zod_globalConfig ??= {}).jitless = true;

// A module (its only work is the line above), so it can be imported and checked.
export {};
