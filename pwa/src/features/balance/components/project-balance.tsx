import { ProjectPicker } from '../../../components/project-picker';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { useChosenProject } from '../../../lib/projects/chosen-project';
import { useProjects, type Project } from '../../../lib/projects/get-projects';
import { BalanceView } from './balance-view';

/** The project list, a picker when there are several (remembered), then the chosen balance. */
export function ProjectBalance({ emptyNote }: { emptyNote: string }) {
  const projects = useProjects();
  return (
    <QueryView
      query={projects}
      what="your projects"
      offlineNote="The balance needs the network. It will load as soon as you are back online."
      isEmpty={(list) => list.length === 0}
      empty={
        <EmptyPanel title="No projects yet">
          <p>{emptyNote}</p>
        </EmptyPanel>
      }
    >
      {(list) => <Chosen projects={list} />}
    </QueryView>
  );
}

function Chosen({ projects }: { projects: Project[] }) {
  const [project, choose] = useChosenProject(projects);
  if (!project) return null;
  return (
    <>
      <ProjectPicker projects={projects} value={project.id} onChange={choose} />
      <BalanceView key={project.id} projectId={project.id} targetSize={project.targetSize} />
    </>
  );
}
