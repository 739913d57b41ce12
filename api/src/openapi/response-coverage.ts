import type { OpenAPIObject } from '@nestjs/swagger';

const METHODS = ['get', 'put', 'post', 'delete', 'options', 'head', 'patch', 'trace'] as const;

/**
 * Routes ("GET /api/x") whose success is not described: no 2xx response with a schema in
 * its content, nor a 204 described in words (@ApiNoContentResponse({ description })).
 * Nest's swagger module gives an undecorated route an empty 200/201 entry, which counts as missing.
 */
export function routesWithoutResponseSchema(document: OpenAPIObject): string[] {
  const missing: string[] = [];
  for (const [path, item] of Object.entries(document.paths)) {
    for (const method of METHODS) {
      const operation = item[method];
      if (!operation) continue;
      const described = Object.entries(operation.responses ?? {}).some(([status, response]) => {
        if (!/^2\d\d$/.test(status) || !response || '$ref' in response) return false;
        if (status === '204') return Boolean(response.description);
        return Object.values(response.content ?? {}).some((media) => media.schema !== undefined);
      });
      if (!described) missing.push(`${method.toUpperCase()} ${path}`);
    }
  }
  return missing;
}
