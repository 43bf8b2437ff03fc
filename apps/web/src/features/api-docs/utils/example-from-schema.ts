function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * An example value for a (resolved) JSON schema: the schema's own example, default, const or first
 * enum value when it gives one; otherwise the smallest value its type and bounds allow. Objects get
 * their required properties only, so the example stays valid where options depend on each other.
 */
export function exampleFromSchema(schema: unknown, depth = 0): unknown {
  if (!isObject(schema) || depth > 10) return null;
  if ('example' in schema) return schema.example;
  if (Array.isArray(schema.examples) && schema.examples.length > 0) return schema.examples[0];
  if ('const' in schema) return schema.const;
  if ('default' in schema) return schema.default;
  if (Array.isArray(schema.enum) && schema.enum.length > 0) return schema.enum[0];
  for (const key of ['oneOf', 'anyOf'] as const) {
    const options = schema[key];
    if (Array.isArray(options)) {
      const first = options.find((o) => !(isObject(o) && o.type === 'null')) ?? options[0];
      return exampleFromSchema(first, depth + 1);
    }
  }
  if (Array.isArray(schema.allOf)) {
    return Object.assign({}, ...schema.allOf.map((part) => exampleFromSchema(part, depth + 1)).filter(isObject));
  }
  const type = Array.isArray(schema.type) ? schema.type.find((t) => t !== 'null') : schema.type;
  switch (type) {
    case 'object': {
      const properties = isObject(schema.properties) ? schema.properties : {};
      const required = Array.isArray(schema.required) ? schema.required.filter((r): r is string => typeof r === 'string') : [];
      return Object.fromEntries(required.map((name) => [name, exampleFromSchema(properties[name], depth + 1)]));
    }
    case 'array': {
      if (Array.isArray(schema.prefixItems)) return schema.prefixItems.map((item) => exampleFromSchema(item, depth + 1));
      const count = typeof schema.minItems === 'number' ? Math.max(1, schema.minItems) : 1;
      return Array.from({ length: count }, () => exampleFromSchema(schema.items, depth + 1));
    }
    case 'integer':
    case 'number': {
      if (typeof schema.minimum === 'number') return schema.minimum;
      if (typeof schema.exclusiveMinimum === 'number') return type === 'integer' ? Math.floor(schema.exclusiveMinimum) + 1 : schema.exclusiveMinimum + 1;
      return type === 'integer' ? 1 : 1.0;
    }
    case 'boolean':
      return false;
    case 'string':
      return typeof schema.minLength === 'number' && schema.minLength > 0 ? 'x'.repeat(schema.minLength) : 'text';
    default:
      return null;
  }
}
