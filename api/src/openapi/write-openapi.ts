// `node api/dist/openapi/write-openapi.js FILE`: writes the API's OpenAPI document as JSON
// (used by scripts/api-types.ts; needs neither a running server nor a database).
import 'reflect-metadata';
import { writeFileSync } from 'node:fs';
import { openApiDocumentOfApp } from './openapi-document.js';

const target = process.argv[2];
if (!target) {
  console.error('usage: node api/dist/openapi/write-openapi.js FILE');
  process.exit(2);
}
writeFileSync(target, `${JSON.stringify(await openApiDocumentOfApp(), null, 2)}\n`);
