import { newClientId } from '../../../lib/client-id';

/** A v4 uuid made in the browser (see lib/client-id.ts). */
export const clientId = (): string => newClientId();
