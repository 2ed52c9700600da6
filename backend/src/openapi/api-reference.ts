import type { INestApplication } from '@nestjs/common';
import { SwaggerModule, type OpenAPIObject } from '@nestjs/swagger';
import { createOpenApiDocument, loadOpenApiMetadata } from './openapi-document.js';

/** Where the description and its reading page are served (under the /api prefix). */
export const OPENAPI_JSON_PATH = 'openapi.json';
export const API_REFERENCE_PATH = 'reference';

/**
 * GET /api/openapi.json (the description) and GET /api/reference (a page to read it: Swagger UI
 * from the installed swagger-ui-dist, served by the app itself; its scripts are files of this
 * origin, so the app's Content-Security-Policy needs no exception).
 *
 * Both are open without a session, like the health check: they describe the routes, never a
 * workshop's data. They are registered on the HTTP server directly (not as a controller), so
 * they are not in the document themselves. The document is made on the first request.
 */
export async function mountApiReference(app: INestApplication): Promise<void> {
  await loadOpenApiMetadata();
  let document: OpenAPIObject | null = null;
  SwaggerModule.setup(API_REFERENCE_PATH, app, () => (document ??= createOpenApiDocument(app)), {
    useGlobalPrefix: true,
    jsonDocumentUrl: OPENAPI_JSON_PATH,
    raw: ['json'],
    customSiteTitle: 'Railwright API reference',
    customfavIcon: '/railwright.svg',
    // The page's own bar links to the outside world; the app's name is in the document's title.
    customCss: '.swagger-ui .topbar { display: none }',
    swaggerOptions: {
      // No badge from an outside validator service: nothing on the page loads from elsewhere.
      validatorUrl: null,
      // Tries from the page carry the session cookie of whoever is signed in.
      withCredentials: true,
      docExpansion: 'none',
      tagsSorter: 'alpha',
      displayOperationId: false,
    },
  });
}
