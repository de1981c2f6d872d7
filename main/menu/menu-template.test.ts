import { describe, expect, it } from 'vitest';
import type { MenuItemConstructorOptions } from 'electron';
import { buildMenuTemplate } from './menu-template.js';
import type { MenuCommand } from '../../types/desktop-api.js';

function flatten(items: MenuItemConstructorOptions[]): MenuItemConstructorOptions[] {
  return items.flatMap((i) => [i, ...(Array.isArray(i.submenu) ? flatten(i.submenu) : [])]);
}

function menuFor(platform: NodeJS.Platform, recent: string[] = []) {
  const sent: MenuCommand[] = [];
  const opened: string[] = [];
  const template = buildMenuTemplate(platform, recent, {
    send: (c) => sent.push(c),
    newWindow: () => sent.push('new'),
    openDialog: () => sent.push('open'),
    openRecent: (p) => opened.push(p),
    clearRecent: () => {},
  });
  const byLabel = (label: string) => flatten(template).find((i) => i.label === label);
  return { template, sent, opened, byLabel };
}

const click = (item: MenuItemConstructorOptions | undefined) => (item?.click as (() => void) | undefined)?.();

describe('application menu', () => {
  it.each([
    ['New Scenario', 'CmdOrCtrl+N', 'new'],
    ['Open…', 'CmdOrCtrl+O', 'open'],
    ['Save', 'CmdOrCtrl+S', 'save'],
    ['Save As…', 'CmdOrCtrl+Shift+S', 'save-as'],
    ['Undo', 'CmdOrCtrl+Z', 'undo'],
    ['Redo', 'CmdOrCtrl+Shift+Z', 'redo'],
    ['Export Comparison as CSV…', 'CmdOrCtrl+E', 'export-csv'],
    ['Export Briefing as PDF…', 'CmdOrCtrl+P', 'export-pdf'],
  ] as const)('%s uses the usual accelerator %s and triggers %s', (label, accelerator, command) => {
    const { byLabel, sent } = menuFor('linux');
    expect(byLabel(label)?.accelerator).toBe(accelerator);
    click(byLabel(label));
    expect(sent).toEqual([command]);
  });

  it('uses Ctrl+Y for redo on Windows and adds the app menu on macOS', () => {
    expect(menuFor('win32').byLabel('Redo')?.accelerator).toBe('Ctrl+Y');
    expect(menuFor('darwin').template[0]?.role).toBe('appMenu');
  });

  it('lists recent scenarios and opens the one picked', () => {
    const { byLabel, opened } = menuFor('linux', ['/s/a.zeitlight', '/s/b.zeitlight']);
    click(byLabel('/s/b.zeitlight'));
    expect(opened).toEqual(['/s/b.zeitlight']);
    expect(menuFor('linux').byLabel('No recent scenarios')?.enabled).toBe(false);
  });
});
