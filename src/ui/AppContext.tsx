import { createContext, useContext, useMemo, type ReactNode } from 'react';
import { useStore } from 'zustand';
import type { AppState, AppStore } from '../state/store';
import type { DocumentApi } from '../state/documentApi';
import { CanvasController } from '../state/canvasController';

interface AppServices {
  store: AppStore;
  api: DocumentApi;
  controller: CanvasController;
}

const Ctx = createContext<AppServices | null>(null);

export function AppProvider({ store, api, children }: { store: AppStore; api: DocumentApi; children: ReactNode }) {
  const value = useMemo(() => ({ store, api, controller: new CanvasController(store) }), [store, api]);
  return <Ctx.Provider value={value}>{children}</Ctx.Provider>;
}

function useServices(): AppServices {
  const v = useContext(Ctx);
  if (!v) throw new Error('AppProvider is missing');
  return v;
}

export function useApp<T>(selector: (s: AppState) => T): T {
  return useStore(useServices().store, selector);
}

export const useAppStore = () => useServices().store;
export const useDocumentApi = () => useServices().api;
export const useController = () => useServices().controller;
