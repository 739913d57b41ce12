// Which project the person last looked at, remembered on this device (localStorage) so the
// quota board and the balance open on it next time. Only an id: no server data is kept here.
import { useCallback, useState } from 'react';
import type { Project } from './get-projects';

const storageKey = 'plumbline.chosen-project';

function readChoice(): string | null {
  try {
    return window.localStorage.getItem(storageKey);
  } catch {
    return null;
  }
}

/** Remember a project as the current one, e.g. when the lead opens its balance. */
export function rememberProject(id: string): void {
  try {
    window.localStorage.setItem(storageKey, id);
  } catch {
    // Private mode or full storage: nothing to remember.
  }
}

/** The remembered project when it is still in the list, otherwise the first one in the field, otherwise the first. */
export function useChosenProject(projects: Project[]): [Project | undefined, (id: string) => void] {
  const [chosenId, setChosenId] = useState<string | null>(readChoice);
  const choose = useCallback((id: string) => {
    setChosenId(id);
    rememberProject(id);
  }, []);
  const chosen = projects.find((p) => p.id === chosenId) ?? projects.find((p) => p.status === 'fieldwork') ?? projects[0];
  return [chosen, choose];
}
