// @ts-nocheck
// Setup for the mutation run only (vitest.mutation.config.ts): a property that fails under a
// mutant has done its job, so fast-check stops there instead of shrinking the counterexample,
// which can cost hundreds of extra runs of the model per killed mutant. `npm test` shrinks as usual.
import fc from "fast-check";

fc.configureGlobal({ endOnFailure: true });
