// Runs in the browser before the app's own code. zod probes whether it may compile validators with
// `new Function`; under the content security policy (no 'unsafe-eval') the probe is reported as a violation
// even though zod falls back. Skip the probe: validation works the same without it. Only zod's config is
// imported (one global object the whole of zod reads): the validators themselves load with the pages that use them.
import { config } from "zod/v4/core";

config({ jitless: true });
