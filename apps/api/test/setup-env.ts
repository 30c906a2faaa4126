// Quiet logs and a generous login limit unless a test asks otherwise.
process.env.NODE_ENV ??= 'test';
process.env.LOG_LEVEL ??= 'silent';
