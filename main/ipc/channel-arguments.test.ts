import { describe, expect, it } from 'vitest';
import { checkChannelArguments } from './channel-arguments.js';
import { registerIpcHandlers, type ChannelHandlers } from './register-handlers.js';
import type { IpcMainInvokeEvent } from 'electron';

describe('IPC argument validation', () => {
  it('accepts a well-formed save request', () => {
    expect(checkChannelArguments('document:save', [{ text: '{}', mode: 'save-as' }]).ok).toBe(true);
  });

  it.each([
    ['an unknown save mode', 'document:save', [{ text: '{}', mode: 'overwrite' }]],
    ['an extra field', 'document:save', [{ text: '{}', mode: 'save', path: '/etc/passwd' }]],
    ['a missing argument', 'document:save', []],
    ['a non-string text', 'document:edited', [{ dirty: true, text: 42 }]],
    ['arguments on an argument-less channel', 'document:open', ['/tmp/x']],
    ['a CSV name with a folder', 'export:csv', [{ suggestedName: '../../evil.csv', csvText: 'a' }]],
    ['a CSV name with a Windows folder', 'export:csv', [{ suggestedName: 'C:\\x.csv', csvText: 'a' }]],
    ['a PDF name with the wrong extension', 'export:pdf', [{ suggestedName: 'briefing.exe' }]],
    ['a name with a control character', 'export:pdf', [{ suggestedName: 'brief\u0007ing.pdf' }]],
  ] as const)('rejects %s', (_what, channel, args) => {
    const check = checkChannelArguments(channel, args);
    expect(check.ok).toBe(false);
    if (!check.ok) expect(check.message).toContain(channel);
  });

  it('rejects a scenario text above the size limit', () => {
    const huge = 'x'.repeat(20_000_001);
    expect(checkChannelArguments('document:edited', [{ dirty: true, text: huge }]).ok).toBe(false);
  });
});

describe('IPC handler registration', () => {
  function setup() {
    const registered = new Map<string, (event: IpcMainInvokeEvent, ...args: unknown[]) => unknown>();
    const calls: unknown[][] = [];
    const handlers = {
      'document:initial': () => ({ kind: 'empty' }),
      'document:open': () => ({ status: 'cancelled' }),
      'document:save': (_e: unknown, r: unknown) => {
        calls.push([r]);
        return { status: 'cancelled' };
      },
      'document:edited': () => undefined,
      'export:csv': () => ({ status: 'cancelled' }),
      'export:pdf': () => ({ status: 'cancelled' }),
    } as unknown as ChannelHandlers;
    registerIpcHandlers({ handle: (c: string, l: (event: IpcMainInvokeEvent, ...args: unknown[]) => unknown) => void registered.set(c, l) } as never, handlers, () => 'zeitlight://app/index.html');
    const call = (url: string, channel: string, ...args: unknown[]) => registered.get(channel)!({ senderFrame: { url } } as unknown as IpcMainInvokeEvent, ...args);
    return { registered, calls, call };
  }

  it('registers a handler for every channel of the contract', () => {
    expect([...setup().registered.keys()].sort()).toEqual(['document:edited', 'document:initial', 'document:open', 'document:save', 'export:csv', 'export:pdf']);
  });

  it('passes validated arguments to the handler for calls from the app page', async () => {
    const { calls, call } = setup();
    await call('zeitlight://app/index.html?x=1', 'document:save', { text: '{}', mode: 'save' });
    expect(calls).toEqual([[{ text: '{}', mode: 'save' }]]);
  });

  it('refuses calls from any other page and calls with bad arguments, before the handler runs', () => {
    const { calls, call } = setup();
    expect(() => call('https://example.org/', 'document:save', { text: '{}', mode: 'save' })).toThrow(/unexpected page/);
    expect(() => call('zeitlight://app/index.html', 'document:save', { text: 1 })).toThrow(/document:save/);
    expect(calls).toEqual([]);
  });
});
