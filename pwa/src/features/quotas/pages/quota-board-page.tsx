import { ChosenProjectView } from '../../../components/chosen-project-view';
import { PageFrame } from '../../../components/page-frame';
import { QuotaBoard } from '../components/quota-board';

/** The supervisor's home: the board of the chosen project (the choice is remembered). */
export function QuotaBoardPage() {
  return (
    <PageFrame title="Quota board" lead="Every cell of the project: what is achieved, what is still to find, and who is finding it.">
      <ChosenProjectView needs="The quota board" emptyNote="Once a project lead adds you to a project, its cells appear here.">
        {(project) => <QuotaBoard key={project.id} projectId={project.id} />}
      </ChosenProjectView>
    </PageFrame>
  );
}
