export * from './connections.js';
export * from './parts/part.schema.js';
