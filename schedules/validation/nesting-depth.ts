/**
 * Nesting depth of a parsed JSON value. A scenario nests about ten levels; a value nested much
 * deeper (a runaway generator, a damaged file) is cut off at MAX_NESTING_DEPTH before the schema
 * and the sense checks look at it, so that no check runs out of stack. Iterative, so any depth
 * JSON.parse accepts is fine here.
 */

/** Deepest nesting a scenario may have (it uses about 10 levels). */
export const MAX_NESTING_DEPTH = 64;

export interface CutNesting {
  /** The value with every part deeper than the limit replaced by null. */
  readonly value: unknown;
  /** Paths (as key lists) of the parts that were cut off. */
  readonly cut: readonly (readonly (string | number)[])[];
}

export function cutDeepNesting(root: unknown, max = MAX_NESTING_DEPTH): CutNesting {
  const cut: (string | number)[][] = [];
  if (root === null || typeof root !== 'object') return { value: root, cut };
  const copyOf = (v: object): Record<string, unknown> | unknown[] => (Array.isArray(v) ? [...(v as unknown[])] : { ...(v as Record<string, unknown>) });
  const top = copyOf(root);
  // Each entry: a copied container, its path and depth; its children are copied in turn.
  const stack: { node: Record<string, unknown> | unknown[]; path: (string | number)[]; depth: number }[] = [{ node: top, path: [], depth: 1 }];
  while (stack.length > 0) {
    const { node, path, depth } = stack.pop() as (typeof stack)[number];
    const keys: (string | number)[] = Array.isArray(node) ? node.map((_, i) => i) : Object.keys(node);
    for (const k of keys) {
      const child = (node as Record<string | number, unknown>)[k];
      if (child === null || typeof child !== 'object') continue;
      if (depth >= max) {
        (node as Record<string | number, unknown>)[k] = null;
        if (cut.length < 20) cut.push([...path, k]);
        continue;
      }
      const copy = copyOf(child);
      (node as Record<string | number, unknown>)[k] = copy;
      stack.push({ node: copy, path: [...path, k], depth: depth + 1 });
    }
  }
  return { value: top, cut };
}
