// The supervisor's interviewers: for the chosen project, each interviewer's rates, flags and
// back-checks first (what a supervisor checks every day), then each interviewer's assignment
// (completes to reach, cells to work) and completes so far, to set or clear.
import { AssignmentsPanel } from '../../../components/assignments/assignments-panel';
import { ChosenProjectView } from '../../../components/chosen-project-view';
import { PageFrame } from '../../../components/page-frame';
import { QueryView } from '../../../components/query-view';
import { useMembers } from '../../../lib/projects/get-members';
import { InterviewerRatesSection } from '../components/interviewer-rates';

export function InterviewersPage() {
  return (
    <PageFrame
      title="Interviewers"
      lead="Each interviewer’s rates, flags and back-checks; below, give each a number of completes to reach and, if you like, cells to work."
    >
      <ChosenProjectView needs="The interviewers list" emptyNote="Once a project lead adds you to a project, its interviewers appear here.">
        {(project) => (
          <div key={project.id}>
            <InterviewerRatesSection projectId={project.id} />
            <ProjectInterviewers projectId={project.id} />
          </div>
        )}
      </ChosenProjectView>
    </PageFrame>
  );
}

function ProjectInterviewers({ projectId }: { projectId: string }) {
  const members = useMembers(projectId);
  return (
    <section aria-labelledby="pl-assignments-title">
      <h2 id="pl-assignments-title">Assignments</h2>
      <QueryView query={members} what="the team" offlineNote="The team needs the network." isEmpty={() => false} empty={null}>
        {(team) => <AssignmentsPanel projectId={projectId} interviewers={team.filter((m) => m.role === 'interviewer')} />}
      </QueryView>
    </section>
  );
}
