import { describe, expect, it } from 'vitest';
import { createBrowserAdapter, initialDocumentFromQuery } from './browser-adapter.js';

describe('browser adapter', () => {
  it('opens the demo scenario for ?open=demo and an empty workspace otherwise', async () => {
    expect(initialDocumentFromQuery('?open=demo')).toEqual({ kind: 'demo' });
    expect(initialDocumentFromQuery('?open=demo&lang=en')).toEqual({ kind: 'demo' });
    expect(initialDocumentFromQuery('?open=other')).toEqual({ kind: 'empty' });
    expect(initialDocumentFromQuery('')).toEqual({ kind: 'empty' });
    expect(await createBrowserAdapter({ search: '?open=demo' }).initialDocument()).toEqual({ kind: 'demo' });
  });

  it('says it is the web platform', () => {
    expect(createBrowserAdapter({ search: '' }).platform).toBe('web');
  });
});
