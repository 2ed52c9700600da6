import type { ExceptionFilter } from '@nestjs/common';
import { EngineInputErrorFilter } from './engine-input-error.filter.js';

/**
 * Filters that modules add for their own error types (for example the engine's input errors → 400).
 * Add a line here; they are tried before the catch-all database filter.
 */
export function appFilters(): ExceptionFilter[] {
  return [new EngineInputErrorFilter()];
}
