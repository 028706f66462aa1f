import { loadEnvFiles } from './load-env';
import { migrateAndSeed } from './db-tasks';

loadEnvFiles();
migrateAndSeed({ seed: false }).catch((error) => {
  console.error(error);
  process.exit(1);
});
