// Bad input, part 2: every JSON handler outside app/api/routes/**; split in two files so vitest runs them on both cores.
import { fuzzEndpoints } from './support/fuzz-harness';

await fuzzEndpoints({ select: (route) => !route.startsWith('routes/') });
