/**
 * Text PostgreSQL cannot store (a NUL character) or that is not valid Unicode (a lone UTF-16
 * surrogate, which JSON's "\ud800" escape can produce) is refused where it enters, naming the field.
 */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export function textProblem(text: string): string | null {
  if (text.includes('\u0000')) return 'contains a null character (U+0000); remove it and try again.';
  if (LONE_SURROGATE.test(text)) return 'contains a broken character (a lone UTF-16 surrogate); remove it and try again.';
  return null;
}

export interface UnsafeText {
  /** the field as zod names it: "lines.3.input" */
  field: string;
  message: string;
}

/** The first string (value or object key) anywhere in `value` that cannot be stored as text. */
export function findUnsafeText(value: unknown, root = ''): UnsafeText | null {
  const stack: { value: unknown; path: string }[] = [{ value, path: root }];
  while (stack.length > 0) {
    const { value: current, path } = stack.pop()!;
    if (typeof current === 'string') {
      const problem = textProblem(current);
      if (problem) return { field: path || 'body', message: problem };
    } else if (Array.isArray(current)) {
      for (let i = current.length - 1; i >= 0; i--) stack.push({ value: current[i], path: path ? `${path}.${i}` : String(i) });
    } else if (current && typeof current === 'object') {
      for (const [key, inner] of Object.entries(current)) {
        const field = path ? `${path}.${key}` : key;
        const keyProblem = textProblem(key);
        if (keyProblem) return { field: path || 'body', message: `has a field name that ${keyProblem}` };
        stack.push({ value: inner, path: field });
      }
    }
  }
  return null;
}
