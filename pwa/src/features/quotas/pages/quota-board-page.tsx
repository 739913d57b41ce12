import { PageFrame } from '../../../components/page-frame';
import { ProjectPicker } from '../../../components/project-picker';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { useChosenProject } from '../../../lib/projects/chosen-project';
import { useProjects, type Project } from '../../../lib/projects/get-projects';
import { QuotaBoard } from '../components/quota-board';

/** The supervisor's home: the board of the chosen project (the choice is remembered). */
export function QuotaBoardPage() {
  const projects = useProjects();
  return (
    <PageFrame title="Quota board" lead="Every cell of the project: what is achieved, what is still to find, and who is finding it.">
      <QueryView
        query={projects}
        what="your projects"
        offlineNote="The quota board needs the network. It will load as soon as you are back online."
        isEmpty={(list) => list.length === 0}
        empty={
          <EmptyPanel title="No projects yet">
            <p>Once a project lead adds you to a project, its cells appear here.</p>
          </EmptyPanel>
        }
      >
        {(list) => <ChosenBoard projects={list} />}
      </QueryView>
    </PageFrame>
  );
}

function ChosenBoard({ projects }: { projects: Project[] }) {
  const [project, choose] = useChosenProject(projects);
  if (!project) return null;
  return (
    <>
      <ProjectPicker projects={projects} value={project.id} onChange={choose} />
      <QuotaBoard key={project.id} projectId={project.id} />
    </>
  );
}
