/**
 * Setup file (runs before each test file): one fixed seed for every property-based test
 * (fast-check), so a failure reproduces run after run. fast-check prints the seed and the
 * counterexample path of a failure; to explore other random cases set WAYWARD_FC_SEED to
 * another integer (the seed in use is then printed once per file).
 */
import fc from 'fast-check';

/** The project's fixed seed for property-based tests (any fixed integer would do). */
export const PROPERTY_SEED = 20_261_203;

const fromEnv = process.env.WAYWARD_FC_SEED;
const seed = fromEnv === undefined || fromEnv === '' ? PROPERTY_SEED : Number(fromEnv);
if (!Number.isSafeInteger(seed)) throw new RangeError(`WAYWARD_FC_SEED='${fromEnv}' is not an integer`);
if (seed !== PROPERTY_SEED) console.log(`fast-check seed ${seed} (WAYWARD_FC_SEED)`);
fc.configureGlobal({ ...fc.readConfigureGlobal(), seed });
