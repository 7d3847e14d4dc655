// The payment API's request bodies are form-encoded with bracketed keys for nesting, e.g.
// `line_items[0][price_data][unit_amount]=5000&metadata[estimateId]=e1`. This rebuilds the object.

export type FormValue = string | FormObject | FormValue[];
export type FormObject = { [key: string]: FormValue };

const UNSAFE_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

export function parseBracketForm(body: string): FormObject {
  const root: FormObject = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const path = keyPath(key);
    // Never let a key like `__proto__[x]` reach Object.prototype.
    if (path.length === 0 || path.some((segment) => UNSAFE_KEYS.has(segment))) continue;
    assign(root, path, value);
  }
  return root;
}

/** `a[b][0]` → ['a', 'b', '0']; `a[]` appends. */
function keyPath(key: string): string[] {
  const head = /^[^[]+/.exec(key)?.[0];
  if (!head) return [];
  const rest = [...key.slice(head.length).matchAll(/\[([^\]]*)\]/g)].map((match) => match[1] ?? '');
  return [head, ...rest];
}

function assign(root: FormObject, path: string[], value: string): void {
  let container: FormObject | FormValue[] = root;
  path.forEach((segment, depth) => {
    const isLast = depth === path.length - 1;
    const nextIsIndex = !isLast && /^\d*$/.test(path[depth + 1] ?? '');
    const slot = Array.isArray(container) && segment === '' ? container.length : segment;
    const existing = (container as Record<string | number, FormValue | undefined>)[slot];
    if (isLast) {
      (container as Record<string | number, FormValue>)[slot] = value;
      return;
    }
    const child: FormObject | FormValue[] =
      existing !== undefined && typeof existing === 'object' ? existing : nextIsIndex ? [] : {};
    (container as Record<string | number, FormValue>)[slot] = child;
    container = child;
  });
}

/** Reads a nested value, e.g. `valueAt(body, 'line_items', 0, 'price_data')`. */
export function valueAt(value: FormValue | undefined, ...path: Array<string | number>) {
  let current: FormValue | undefined = value;
  for (const segment of path) {
    if (current === undefined || typeof current === 'string') return undefined;
    current = (current as Record<string | number, FormValue | undefined>)[segment];
  }
  return current;
}

/** Reads a nested string, e.g. `stringAt(body, 'line_items', 0, 'price_data', 'currency')`. */
export function stringAt(value: FormValue | undefined, ...path: Array<string | number>) {
  const found = valueAt(value, ...path);
  return typeof found === 'string' ? found : undefined;
}
