/** Reading the app's own OpenAPI document (GET /api/docs-json): schemas resolved, minimal valid samples. */
export interface Schema {
  $ref?: string;
  type?: string;
  format?: string;
  enum?: unknown[];
  nullable?: boolean;
  properties?: Record<string, Schema>;
  required?: string[];
  items?: Schema;
  allOf?: Schema[];
  oneOf?: Schema[];
  anyOf?: Schema[];
  minimum?: number;
  maximum?: number;
  minLength?: number;
  maxLength?: number;
  minItems?: number;
  maxItems?: number;
  pattern?: string;
  additionalProperties?: boolean | Schema;
}

export interface Parameter {
  name: string;
  in: 'path' | 'query' | 'header';
  required?: boolean;
  schema?: Schema;
}

export interface Operation {
  parameters?: Parameter[];
  requestBody?: { content: Record<string, { schema: Schema }> };
}

export interface OpenApiDocument {
  paths: Record<string, Record<string, Operation>>;
  components: { schemas: Record<string, Schema> };
}

/** `/api/projects/:id/quotes` → `/api/projects/{id}/quotes`. */
export function openApiPath(expressPath: string): string {
  return expressPath.replace(/:(\w+)/g, '{$1}');
}

export function resolve(doc: OpenApiDocument, schema: Schema | undefined, depth = 0): Schema | undefined {
  if (!schema || depth > 20) return schema;
  if (schema.$ref) return resolve(doc, doc.components.schemas[schema.$ref.replace('#/components/schemas/', '')], depth + 1);
  if (schema.allOf?.length) {
    const parts = schema.allOf.map((part) => resolve(doc, part, depth + 1) ?? {});
    return {
      ...Object.assign({}, ...parts),
      properties: Object.assign({}, ...parts.map((part) => part.properties ?? {})),
      required: parts.flatMap((part) => part.required ?? []),
      nullable: schema.nullable,
    };
  }
  return schema;
}

export function requestSchema(doc: OpenApiDocument, operation: Operation | undefined): { type: 'json' | 'multipart' | null; schema?: Schema } {
  const content = operation?.requestBody?.content ?? {};
  if (content['multipart/form-data']) return { type: 'multipart', schema: resolve(doc, content['multipart/form-data'].schema) };
  if (content['application/json']) return { type: 'json', schema: resolve(doc, content['application/json'].schema) };
  return { type: null };
}

/** A smallest value the schema accepts: required properties only, the first enum value, the minimum. */
export function sample(doc: OpenApiDocument, raw: Schema | undefined, depth = 0): unknown {
  const schema = resolve(doc, raw);
  if (!schema || depth > 8) return undefined;
  if (schema.enum?.length) return schema.enum[0];
  const variant = schema.oneOf?.[0] ?? schema.anyOf?.[0];
  if (variant) return sample(doc, variant, depth + 1);
  switch (schema.type) {
    case 'string': {
      if (schema.format === 'uuid') return '00000000-0000-4000-8000-000000000000';
      if (schema.format === 'email') return 'someone@example.test';
      if (schema.format === 'date-time') return '2026-01-01T00:00:00.000Z';
      if (schema.format === 'date') return '2026-01-01';
      if (schema.format === 'binary') return undefined;
      return 'x'.repeat(Math.max(1, schema.minLength ?? 1));
    }
    case 'integer':
    case 'number':
      return schema.minimum !== undefined ? Math.max(schema.minimum, Math.min(1, schema.maximum ?? 1)) : Math.min(1, schema.maximum ?? 1);
    case 'boolean':
      return false;
    case 'array':
      return Array.from({ length: schema.minItems ?? 0 }, () => sample(doc, schema.items, depth + 1));
    default: {
      const body: Record<string, unknown> = {};
      for (const name of schema.required ?? []) {
        const value = sample(doc, schema.properties?.[name], depth + 1);
        if (value !== undefined) body[name] = value;
      }
      return body;
    }
  }
}
