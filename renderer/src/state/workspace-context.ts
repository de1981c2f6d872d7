// React access to the workspace controller and its state.
import { createContext, useContext, useSyncExternalStore } from 'react';
import type { WorkspaceController } from './workspace-controller.js';
import type { WorkspaceState } from './workspace-store.js';

export const WorkspaceContext = createContext<WorkspaceController | null>(null);

export function useController(): WorkspaceController {
  const controller = useContext(WorkspaceContext);
  if (controller === null) throw new Error('WorkspaceContext is missing');
  return controller;
}

export function useWorkspace(): WorkspaceState {
  const { store } = useController();
  return useSyncExternalStore(store.subscribe, store.getSnapshot);
}
