// The suite lives in test/; examples/ holds copyable user files that the suite imports once.
import { defineConfig } from 'vitest/config';

export default defineConfig({ test: { include: ['test/**/*.test.ts'] } });
