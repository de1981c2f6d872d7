// Registers the typed IPC handlers. Each call is accepted only from a frame showing the app
// page and only with arguments that pass the channel's schema.
import type { IpcMain, IpcMainInvokeEvent } from 'electron';
import type { InvokeChannel, InvokeChannels } from '../../types/desktop-api.js';
import { checkChannelArguments } from './channel-arguments.js';
import { isAppPage } from '../security/navigation-guard.js';

export type ChannelHandler<C extends InvokeChannel> = (
  event: IpcMainInvokeEvent,
  ...args: InvokeChannels[C]['args']
) => Promise<InvokeChannels[C]['result']> | InvokeChannels[C]['result'];

export type ChannelHandlers = { [C in InvokeChannel]: ChannelHandler<C> };

export class RejectedIpcCall extends Error {}

export function senderUrl(event: Pick<IpcMainInvokeEvent, 'senderFrame'>): string {
  return event.senderFrame?.url ?? '';
}

export function registerIpcHandlers(ipcMain: Pick<IpcMain, 'handle'>, handlers: ChannelHandlers, appPageUrl: () => string): void {
  for (const channel of Object.keys(handlers) as InvokeChannel[]) {
    ipcMain.handle(channel, (event, ...rawArgs: unknown[]) => {
      if (!isAppPage(senderUrl(event), appPageUrl())) {
        throw new RejectedIpcCall(`${channel}: call from an unexpected page was refused`);
      }
      const check = checkChannelArguments(channel, rawArgs);
      if (!check.ok) throw new RejectedIpcCall(check.message);
      const handler = handlers[channel] as (event: IpcMainInvokeEvent, ...args: readonly unknown[]) => unknown;
      return handler(event, ...check.args);
    });
  }
}
