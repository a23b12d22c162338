import type { OpenAPIHono } from '@hono/zod-openapi';
import type { AppEnv } from '../AppEnv.ts';
import { renderDocsPage } from './renderDocsPage.ts';

export const OPENAPI_INFO = {
  title: 'fringe-ledger API',
  version: '0.1.0',
  description:
    'Fabrication history, fringe readings and residual analysis of transparent photoelastic models. ' +
    'Authenticate with "Authorization: Bearer <key>"; errors are RFC 9457 problem+json.',
};

export function docsRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openAPIRegistry.registerComponent('securitySchemes', 'apiKey', { type: 'http', scheme: 'bearer', description: 'An API key of the lab, e.g. flk_…' });
  app.doc31('/openapi.json', { openapi: '3.1.0', info: OPENAPI_INFO });
  app.get('/docs', (c) => {
    const document = app.getOpenAPI31Document({ openapi: "3.1.0", info: OPENAPI_INFO }) as unknown as Parameters<typeof renderDocsPage>[0];
    return c.html(renderDocsPage(document));
  });
}
