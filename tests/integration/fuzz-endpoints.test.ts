// Bad input, part 1: the route-scoped JSON handlers (app/api/routes/**). Part 2 is fuzz-endpoints-team.test.ts.
import { fuzzEndpoints } from './support/fuzz-harness';

await fuzzEndpoints({ select: (route) => route.startsWith('routes/'), checkCoverage: true });
