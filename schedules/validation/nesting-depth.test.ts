import { describe, expect, it } from 'vitest';
import { cutDeepNesting } from './nesting-depth.js';
import { validateScenarioText } from './validate-scenario.js';

describe('nesting depth', () => {
  it('cuts off parts nested deeper than the limit and says where, without running out of stack', () => {
    const depth = 200_000;
    const deep = JSON.parse(`{"a": ${'['.repeat(depth)}${']'.repeat(depth)}, "b": {"c": 1}}`) as unknown;
    const r = cutDeepNesting(deep, 3);
    expect(r.cut).toEqual([['a', 0, 0]]);
    expect(r.value).toEqual({ a: [[null]], b: { c: 1 } });
  });

  it('leaves a value within the limit as it is', () => {
    const v = { a: [{ b: [1, 2, { c: 'x' }] }] };
    expect(cutDeepNesting(v, 64)).toEqual({ value: v, cut: [] });
  });

  it('lets validation report a deeply nested field by its path instead of failing', () => {
    const text = `{"format": "zeitlight-scenario", "version": 2, "name": "x", "run": ${'{"a":'.repeat(50_000)}1${'}'.repeat(50_000)}}`;
    const v = validateScenarioText(text);
    expect(v.ok).toBe(false);
    expect(v.problems[0]?.message).toMatch(/nested more than 64 levels deep/);
    expect(v.problems[0]?.path.startsWith('run.a.a.a')).toBe(true);
  });
});
