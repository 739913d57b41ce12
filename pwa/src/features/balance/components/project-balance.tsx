import { ChosenProjectView } from '../../../components/chosen-project-view';
import { BalanceView } from './balance-view';

/** The project list, a picker when there are several (remembered), then the chosen balance. */
export function ProjectBalance({ emptyNote }: { emptyNote: string }) {
  return (
    <ChosenProjectView needs="The balance" emptyNote={emptyNote}>
      {(project) => <BalanceView key={project.id} projectId={project.id} targetSize={project.targetSize} />}
    </ChosenProjectView>
  );
}
