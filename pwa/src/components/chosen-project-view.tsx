import type { ReactNode } from 'react';
import { useChosenProject } from '../lib/projects/chosen-project';
import { useProjects, type Project } from '../lib/projects/get-projects';
import { ProjectPicker } from './project-picker';
import { QueryView } from './query-view';
import { EmptyPanel } from './state-panels';

interface ChosenProjectViewProps {
  /** What needs the network, for the offline note ("The balance", "The quota board"). */
  needs: string;
  /** Said when the person has no project yet. */
  emptyNote: string;
  children: (project: Project) => ReactNode;
}

/**
 * The projects this person may see, a picker when there are several (the choice is
 * remembered on the device), then whatever the page shows for the chosen project.
 */
export function ChosenProjectView({ needs, emptyNote, children }: ChosenProjectViewProps) {
  const projects = useProjects();
  return (
    <QueryView
      query={projects}
      what="your projects"
      offlineNote={`${needs} needs the network. It will load as soon as you are back online.`}
      isEmpty={(list) => list.length === 0}
      empty={
        <EmptyPanel title="No projects yet">
          <p>{emptyNote}</p>
        </EmptyPanel>
      }
    >
      {(list) => <Chosen projects={list}>{children}</Chosen>}
    </QueryView>
  );
}

function Chosen({ projects, children }: { projects: Project[]; children: (project: Project) => ReactNode }) {
  const [project, choose] = useChosenProject(projects);
  if (!project) return null;
  return (
    <>
      <ProjectPicker projects={projects} value={project.id} onChange={choose} />
      {children(project)}
    </>
  );
}
