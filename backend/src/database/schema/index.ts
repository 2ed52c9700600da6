// Every table of the product, one file per domain concept. drizzle-kit reads this file.
export * from './workshops.js';
export * from './users.js';
export * from './target-sets.js';
export * from './machines.js';
export * from './records.js';
export * from './evidence.js';
export * from './rails.js';
export * from './frame.js';
export * from './safety.js';
export * from './drives.js';
export * from './bolt-downs.js';
export * from './approvals.js';
export * from './password-links.js';
export * from './sign-in-attempts.js';
export * from './machine-readiness.js';
export * from './hole-patterns.js';
export * from './backlash.js';
