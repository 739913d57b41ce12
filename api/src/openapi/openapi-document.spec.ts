import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { OpenAPIObject } from '@nestjs/swagger';
import { openApiDocumentOfApp } from './openapi-document.js';
import { routesWithoutResponseSchema } from './response-coverage.js';

const srcDir = join(import.meta.dirname, '..');

describe('the OpenAPI document the client types are generated from', () => {
  it('describes the 2xx answer of every route of the app', async () => {
    const document = await openApiDocumentOfApp();
    const routes = Object.entries(document.paths).flatMap(([path, item]) => Object.keys(item).map((m) => `${m.toUpperCase()} ${path}`));
    // The document really lists the app's routes (not an empty document passing trivially).
    expect(routes).toEqual(expect.arrayContaining(['POST /api/auth/login', 'GET /api/projects/{projectId}/quota-board', 'POST /api/projects/{projectId}/interviews/sync']));
    expect(routesWithoutResponseSchema(document)).toEqual([]);
    const login = document.paths['/api/auth/login']?.post?.responses['200'];
    expect(login).toMatchObject({ content: { 'application/json': { schema: { $ref: '#/components/schemas/SessionResponse' } } } });
  }, 30_000);

  it('names a route that answers without a described body', () => {
    const document = {
      openapi: '3.0.0',
      info: { title: 't', version: '1' },
      paths: {
        '/api/described': { get: { responses: { '200': { description: '', content: { 'application/json': { schema: { type: 'string' } } } } } } },
        '/api/undecorated': { get: { responses: { '200': { description: '' } } }, post: { responses: { '201': { description: '' } } } },
        '/api/gone': { post: { responses: { '204': { description: 'Signed out' } } }, delete: { responses: { '204': { description: '' } } } },
      },
    } as OpenAPIObject;
    expect(routesWithoutResponseSchema(document)).toEqual(['GET /api/undecorated', 'POST /api/undecorated', 'DELETE /api/gone']);
  });

  it('gives every DTO class its own name, since the document keys schemas by class name', () => {
    const files = readdirSync(srcDir, { recursive: true, encoding: 'utf8' }).filter((f) => /(^|[\\/])dto[\\/][^\\/]+\.dto\.ts$/.test(f));
    const seen = new Map<string, string>();
    const clashes: string[] = [];
    for (const file of files) {
      for (const match of readFileSync(join(srcDir, file), 'utf8').matchAll(/export class (\w+)/g)) {
        const name = match[1] ?? '';
        if (seen.has(name)) clashes.push(`${name} in ${seen.get(name)} and ${file}`);
        else seen.set(name, file);
      }
    }
    expect(seen.size).toBeGreaterThan(20);
    expect(clashes).toEqual([]);
  });
});
