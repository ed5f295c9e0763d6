import { defineConfig } from 'vitest/config';
export default defineConfig({
    test: { include: ['src/**/*.spec.ts'] },
});
//# sourceMappingURL=vitest.config.js.map