// zod for code that may run in the browser: our CSP forbids eval, and zod's fast path probes `new Function`,
// which the browser reports as a violation. Import `z` from here in every shared schema.
import { z } from "zod";

z.config({ jitless: true });

export { z };
