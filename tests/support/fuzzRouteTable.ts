import type { Client } from './client.ts';

export type JsonSchema = Record<string, unknown> & {
  $ref?: string;
  type?: string | string[];
  properties?: Record<string, JsonSchema>;
  required?: string[];
  additionalProperties?: boolean | JsonSchema;
  items?: JsonSchema;
  oneOf?: JsonSchema[];
  anyOf?: JsonSchema[];
  enum?: unknown[];
  example?: unknown;
};

export interface RouteParameter {
  in: 'path' | 'query' | 'header' | 'cookie';
  name: string;
  required?: boolean;
  schema: JsonSchema;
}

export interface WriteRoute {
  method: string;
  /** The path as documented, with {id}-style placeholders. */
  template: string;
  minRole: 'viewer' | 'technician' | 'admin';
  /** Media types of the request body; empty when the route takes none. */
  contentTypes: string[];
  jsonSchema: JsonSchema | undefined;
  parameters: RouteParameter[];
}

export interface RouteTable {
  routes: WriteRoute[];
  /** Follows a #/components/... reference, so callers see plain schemas. */
  resolve(schema: JsonSchema): JsonSchema;
}

interface OpenApiOperation {
  'x-min-role'?: WriteRoute['minRole'];
  parameters?: RouteParameter[];
  requestBody?: { content?: Record<string, { schema?: JsonSchema }> };
}

/**
 * Every write (non-GET) /v1 route of the running app, read from its own OpenAPI document, so a
 * route added tomorrow is fuzzed without touching the tests.
 */
export async function readWriteRoutes(client: Client): Promise<RouteTable> {
  const doc = (await client.get('/openapi.json')).body as { paths: Record<string, Record<string, OpenApiOperation>> };
  const resolve = (schema: JsonSchema): JsonSchema => {
    let current = schema;
    for (let depth = 0; current.$ref && depth < 10; depth++) {
      const target = current.$ref.replace(/^#\//, '').split('/').reduce<unknown>((node, key) => (node as Record<string, unknown>)[key], doc);
      current = target as JsonSchema;
    }
    return current;
  };
  const routes: WriteRoute[] = [];
  for (const [template, operations] of Object.entries(doc.paths)) {
    for (const [method, operation] of Object.entries(operations)) {
      if (method === 'get' || !operation['x-min-role'] || !template.startsWith('/v1/')) continue;
      const content = operation.requestBody?.content ?? {};
      const json = content['application/json']?.schema;
      routes.push({
        method: method.toUpperCase(),
        template,
        minRole: operation['x-min-role'],
        contentTypes: Object.keys(content),
        jsonSchema: json ? resolve(json) : undefined,
        parameters: operation.parameters ?? [],
      });
    }
  }
  return { routes, resolve };
}
