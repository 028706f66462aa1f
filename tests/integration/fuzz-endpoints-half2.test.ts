// Bad input, half 2: the JSON handlers fuzz-endpoints.test.ts leaves out.
import { fuzzEndpoints } from './support/fuzz-harness';

await fuzzEndpoints({ half: 1 });
