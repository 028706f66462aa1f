// Bad input, half 1: every other JSON handler in app/api (the rest in fuzz-endpoints-half2.test.ts, so vitest runs both halves at once).
import { fuzzEndpoints } from './support/fuzz-harness';

await fuzzEndpoints({ half: 0, checkCoverage: true });
