// Runs in the browser before the app's own code. zod probes whether it may compile validators with
// `new Function`; under the content security policy (no 'unsafe-eval') the probe is reported as a violation
// even though zod falls back. Skip the probe: validation works the same without it.
import { z } from "zod";

z.config({ jitless: true });
