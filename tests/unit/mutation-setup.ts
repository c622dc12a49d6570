// Mutation runs only (vitest.mutation.config.ts): fewer fast-check cases per property, so the
// thousands of mutant runs finish on a shared machine. npm test keeps fast-check's default 100.
import fc from "fast-check";

fc.configureGlobal({ numRuns: 25 });
