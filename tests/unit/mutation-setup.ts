// Mutation runs only (vitest.mutation.config.ts): fewer fast-check cases per property and fewer seeded
// cases of the plan's exhaustive check, so the thousands of mutant runs finish on a shared machine.
// npm test keeps fast-check's default 100 and the 1,000 cases.
import fc from "fast-check";

fc.configureGlobal({ numRuns: 25 });
process.env.FARFIELD_PLAN_CASES = "80";
