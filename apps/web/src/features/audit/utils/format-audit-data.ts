function valueText(value: unknown): string {
  if (value === null || value === undefined) return String(value);
  if (typeof value === 'string') return /\s/.test(value) ? JSON.stringify(value) : value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  return JSON.stringify(value);
}

/**
 * An event's data as compact `key=value` text, one level of nesting spelled with dots
 * (`before.state=in_review after.state=published`). Strings with spaces are quoted.
 */
export function formatAuditData(data: unknown): string {
  if (data === null || data === undefined) return '';
  if (typeof data !== 'object' || Array.isArray(data)) return valueText(data);
  const parts: string[] = [];
  for (const [key, value] of Object.entries(data)) {
    if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
      for (const [inner, innerValue] of Object.entries(value)) parts.push(`${key}.${inner}=${valueText(innerValue)}`);
    } else {
      parts.push(`${key}=${valueText(value)}`);
    }
  }
  return parts.join(' ');
}
