import fs from 'node:fs';
import path from 'node:path';

// Minimal .env reader for scripts (Next loads these files itself for the app).
export function loadEnvFiles(files = ['.env.local', '.env']): void {
  for (const file of files) {
    const full = path.resolve(process.cwd(), file);
    if (!fs.existsSync(full)) continue;
    for (const line of fs.readFileSync(full, 'utf8').split('\n')) {
      const match = line.match(/^\s*([A-Z0-9_]+)\s*=\s*(.*)\s*$/);
      if (!match) continue;
      const [, key, raw] = match;
      if (key && process.env[key] === undefined) process.env[key] = (raw ?? '').replace(/^["']|["']$/g, '');
    }
  }
}
