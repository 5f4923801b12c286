// Text PostgreSQL cannot keep as sent. UTF-8 text columns refuse U+0000 (the query fails: a 500), and jsonb refuses
// the \u0000 escape; an unpaired UTF-16 surrogate (valid in a JSON string escape such as "\ud800", but no character)
// would be written as U+FFFD, silently changing what the person typed. Such input is refused with 400 instead,
// naming where it is. (Invalid UTF-8 bytes are caught earlier, when the body is decoded: see http.ts.)

/** Unpaired surrogates or NUL anywhere in the string. */
// eslint-disable-next-line no-control-regex -- matching U+0000 is the point: PostgreSQL text refuses it.
const UNSTORABLE = /\u0000|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export function isStorableText(s: string): boolean {
  return !UNSTORABLE.test(s);
}

export const UNSTORABLE_MESSAGE = 'Contains a character that cannot be stored (a NUL character or half of a surrogate pair).';

/**
 * The path ("items.0.name", or "body" for the value itself) of the first string or object key in a parsed JSON
 * value that is not storable text; null when there is none. Iterative, so a deeply nested body cannot overflow
 * the stack.
 */
export function findUnstorableText(value: unknown): string | null {
  // Each entry links to its parent, so the path is built only for the one bad value (deep bodies stay linear).
  interface At { value: unknown; key: string | null; parent: At | null }
  const pathOf = (at: At, extra?: string): string => {
    const keys: string[] = extra === undefined ? [] : [extra];
    for (let a: At | null = at; a && a.key !== null; a = a.parent) keys.push(a.key);
    return keys.length ? keys.reverse().join('.') : 'body';
  };
  const stack: At[] = [{ value, key: null, parent: null }];
  while (stack.length > 0) {
    const at = stack.pop()!;
    const v = at.value;
    if (typeof v === 'string') {
      if (!isStorableText(v)) return pathOf(at);
    } else if (Array.isArray(v)) {
      for (let i = v.length - 1; i >= 0; i -= 1) stack.push({ value: v[i], key: String(i), parent: at });
    } else if (v !== null && typeof v === 'object') {
      for (const [k, child] of Object.entries(v)) {
        if (!isStorableText(k)) return pathOf(at, k);
        stack.push({ value: child, key: k, parent: at });
      }
    }
  }
  return null;
}
