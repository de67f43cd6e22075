/**
 * Which projects the components show and act on: the app's (state/appProjects.ts) unless a
 * provider gives another; component tests provide one made over in-memory storage.
 */
import { createContext, useContext } from 'react';
import { useStore } from 'zustand';
import { appProjects } from '../../state/appProjects';
import type { ProjectState, ProjectStore } from '../../state/projectStore';

export const ProjectsContext = createContext<ProjectStore>(appProjects);

/** The projects store itself, for its actions (getState) outside rendering. */
export function useProjectsStore(): ProjectStore {
  return useContext(ProjectsContext);
}

/** A part of the projects' state; re-renders when that part changes. */
export function useProjects<T>(selector: (state: ProjectState) => T): T {
  return useStore(useContext(ProjectsContext), selector);
}
