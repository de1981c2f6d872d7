import { describe, expect, it } from 'vitest';
import { checkChannelArguments } from './channel-arguments.js';
import { registerIpcHandlers, type ChannelHandlers } from './register-handlers.js';
import type { IpcMainInvokeEvent } from 'electron';
import { DEMO_SCENARIO } from '../../schedules/demo/demo-scenario.js';

/** A briefing as the workspace sends it (view trimmed to its required fields). */
const briefing = (patch: Record<string, unknown> = {}) => ({
  kind: 'zeitlight-briefing',
  paper: 'A4',
  generatedOn: '2026-03-30',
  zeitlightVersion: '0.1.0',
  scenario: structuredClone(DEMO_SCENARIO),
  view: { baselineId: 'baseline', days: 14, startDate: '2026-03-23', strategies: [], personas: [], runs: [] },
  ...patch,
});

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
    ['a PDF name with the wrong extension', 'export:pdf', [{ suggestedName: 'briefing.exe', briefing: briefing() }]],
    ['a name with a control character', 'export:pdf', [{ suggestedName: 'brief\u0007ing.pdf', briefing: briefing() }]],
    ['a PDF export without its briefing', 'export:pdf', [{ suggestedName: 'briefing.pdf' }]],
    ['a briefing of another kind', 'export:pdf', [{ suggestedName: 'briefing.pdf', briefing: briefing({ kind: 'zeitlight-results' }) }]],
    ['a briefing on an unknown paper size', 'export:pdf', [{ suggestedName: 'briefing.pdf', briefing: briefing({ paper: 'A3' }) }]],
    ['a briefing whose scenario is not a Zeitlight scenario', 'export:pdf', [{ suggestedName: 'briefing.pdf', briefing: briefing({ scenario: { format: 'other' } }) }]],
    ['a briefing without results', 'export:pdf', [{ suggestedName: 'briefing.pdf', briefing: briefing({ view: { baselineId: 'baseline' } }) }]],
    ['a briefing with an extra field', 'export:pdf', [{ suggestedName: 'briefing.pdf', briefing: briefing({ script: 'alert(1)' }) }]],
  ] as const)('rejects %s', (_what, channel, args) => {
    const check = checkChannelArguments(channel, args);
    expect(check.ok).toBe(false);
    if (!check.ok) expect(check.message).toContain(channel);
  });

  it('accepts a briefing with the scenario, its results view and cohort ranges', () => {
    expect(checkChannelArguments('export:pdf', [{ suggestedName: 'briefing.pdf', briefing: briefing({ cohort: { occupants: 200, seed: 1, ranges: [] } }) }])).toMatchObject({ ok: true });
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
