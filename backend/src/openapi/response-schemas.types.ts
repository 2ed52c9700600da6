import type { ReferenceObject, SchemaObject } from '@nestjs/swagger';

/**
 * What tools/openapi/generate-metadata.mjs reads from the controllers' return types: per handler
 * (`Controller.method`) the schema of its answer (null when it answers nothing), and the named
 * response types those schemas refer to.
 */
export interface ResponseSchemas {
  operations: Record<string, SchemaObject | ReferenceObject | null>;
  components: Record<string, SchemaObject>;
}
