// Checks a JSON answer against the schema the OpenAPI document gives for it, strictly: a
// field the document does not name is a problem too, since the client's generated types
// would not know it. Covers what the API's response classes use: $ref, allOf, oneOf,
// nullable, enum, type, format date-time/uuid, required, items, minItems/maxItems.
import type { OpenAPIObject, ReferenceObject, SchemaObject } from '@nestjs/swagger';

type Schema = SchemaObject | ReferenceObject;

function resolve(doc: OpenAPIObject, schema: Schema): SchemaObject {
  if (!('$ref' in schema)) return schema;
  const name = schema.$ref.replace('#/components/schemas/', '');
  const found = doc.components?.schemas?.[name];
  if (!found) throw new Error(`the document has no schema ${name}`);
  return resolve(doc, found);
}

/** One schema with its allOf members merged in (how Nest writes a nullable or described $ref). */
function flatten(doc: OpenAPIObject, schema: Schema): SchemaObject {
  const own = resolve(doc, schema);
  if (!own.allOf) return own;
  const merged: SchemaObject = { ...own, allOf: undefined };
  for (const part of own.allOf.map((s) => flatten(doc, s))) {
    merged.type ??= part.type;
    merged.enum ??= part.enum;
    merged.items ??= part.items;
    merged.oneOf ??= part.oneOf;
    if (part.properties) merged.properties = { ...merged.properties, ...part.properties };
    if (part.required) merged.required = [...(merged.required ?? []), ...part.required];
  }
  return merged;
}

const DATE_TIME = /^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d(\.\d+)?(Z|[+-]\d\d:\d\d)$/;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function conformanceProblems(doc: OpenAPIObject, schema: Schema, value: unknown, at = 'body'): string[] {
  const s = flatten(doc, schema);
  if (value === null) return s.nullable ? [] : [`${at} is null, which the document does not allow`];
  if (s.oneOf) {
    const matching = s.oneOf.filter((option) => conformanceProblems(doc, option, value, at).length === 0).length;
    return matching === 1 ? [] : [`${at} matches ${matching} of the ${s.oneOf.length} documented shapes, not one`];
  }
  if (s.enum && !s.enum.includes(value)) return [`${at} is ${JSON.stringify(value)}, not one of ${s.enum.join(', ')}`];
  switch (s.type) {
    case 'string':
      if (typeof value !== 'string') return [`${at} is not a string`];
      if (s.format === 'date-time' && !DATE_TIME.test(value)) return [`${at} is not a date-time: ${value}`];
      if (s.format === 'uuid' && !UUID.test(value)) return [`${at} is not a UUID: ${value}`];
      return [];
    case 'number':
    case 'integer':
      return typeof value === 'number' && Number.isFinite(value) ? [] : [`${at} is not a number`];
    case 'boolean':
      return typeof value === 'boolean' ? [] : [`${at} is not true or false`];
    case 'array': {
      if (!Array.isArray(value)) return [`${at} is not a list`];
      const size = [...(s.minItems !== undefined && value.length < s.minItems ? [`${at} has fewer than ${s.minItems} items`] : []),
        ...(s.maxItems !== undefined && value.length > s.maxItems ? [`${at} has more than ${s.maxItems} items`] : [])];
      return [...size, ...value.flatMap((item, i) => (s.items ? conformanceProblems(doc, s.items, item, `${at}[${i}]`) : []))];
    }
    default: {
      if (typeof value !== 'object' || Array.isArray(value)) return [`${at} is not an object`];
      const record = value as Record<string, unknown>;
      const properties = s.properties ?? {};
      return [
        ...(s.required ?? []).filter((key) => !(key in record)).map((key) => `${at}.${key} is missing`),
        ...Object.keys(record).filter((key) => !(key in properties)).map((key) => `${at}.${key} is not in the document`),
        ...Object.entries(record).flatMap(([key, v]) => (properties[key] ? conformanceProblems(doc, properties[key], v, `${at}.${key}`) : [])),
      ];
    }
  }
}

/** The documented schema of a route's answer with this status, e.g. ('get', '/api/projects/{id}', 200). */
export function responseSchema(doc: OpenAPIObject, method: string, path: string, status: number): Schema {
  const response = doc.paths[path]?.[method as 'get']?.responses[String(status)];
  const schema = response && !('$ref' in response) ? response.content?.['application/json']?.schema : undefined;
  if (!schema) throw new Error(`the document describes no JSON answer ${status} for ${method.toUpperCase()} ${path}`);
  return schema;
}
