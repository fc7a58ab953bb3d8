// Property tests run from one seed per run so that a failure can be replayed: FC_SEED=<seed> npm test.
// The seed is printed with any counterexample by fast-check itself.
import fc from 'fast-check';

const seed = process.env.FC_SEED ? Number(process.env.FC_SEED) : 20261202;
fc.configureGlobal({ seed, numRuns: 100 });
