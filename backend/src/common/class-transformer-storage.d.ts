// class-transformer keeps its @Type() metadata here; the validation pipe reads it to find nested DTOs.
declare module 'class-transformer/cjs/storage.js' {
  import type { MetadataStorage } from 'class-transformer/types/MetadataStorage.js';
  export const defaultMetadataStorage: MetadataStorage;
}
