// Our CSP forbids eval; zod's fast path probes `new Function`, which the browser reports as a violation.
// Import this before any zod schema in client code.
import { z } from "zod";

z.config({ jitless: true });
