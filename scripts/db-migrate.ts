import { loadEnvFiles } from './load-env';
import { migrateAndSeed, reportStartupError } from './db-tasks';

loadEnvFiles();
migrateAndSeed({ seed: false }).catch((error) => {
  reportStartupError(error);
  process.exit(1);
});
