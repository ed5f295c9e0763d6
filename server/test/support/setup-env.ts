import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

// ConfigModule reads and validates the environment when AppModule is first imported, so each
// test file gets its own temporary database here, before any test imports the app.
const directory = mkdtempSync(path.join(tmpdir(), 'lockstep-api-'));
process.env.NODE_ENV = 'test';
process.env.DEMO = 'true';
process.env.DATABASE_PATH = path.join(directory, 'lockstep.sqlite');
process.env.LOCKSTEP_TEST_DIRECTORY = directory;
