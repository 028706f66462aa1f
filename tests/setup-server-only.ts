// `server-only` throws outside a React Server build; tests call services directly.
import { vi } from 'vitest';
vi.mock('server-only', () => ({}));
