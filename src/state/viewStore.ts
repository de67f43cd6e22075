/**
 * Which top-level view is on screen (the workbench or the experiments), and a one-line notice
 * for the user after a switch made for them (opening an experiment member in the workbench).
 */
import { create } from 'zustand';

export type AppView = 'workbench' | 'experiments';

export interface ViewState {
  view: AppView;
  notice: string | null;
  show: (view: AppView, notice?: string | null) => void;
  dismissNotice: () => void;
}

export const useViewStore = create<ViewState>()((set) => ({
  view: 'workbench',
  notice: null,
  show: (view, notice = null) => set({ view, notice }),
  dismissNotice: () => set({ notice: null }),
}));
