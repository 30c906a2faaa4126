import { randomBytes } from 'node:crypto';

// Quiet logs and a generous login limit unless a test asks otherwise.
process.env.NODE_ENV ??= 'test';
process.env.LOG_LEVEL ??= 'silent';
// The API has no built-in signing secret; a test run makes its own unless the scripts passed one.
process.env.JWT_SECRET ??= randomBytes(32).toString('hex');
