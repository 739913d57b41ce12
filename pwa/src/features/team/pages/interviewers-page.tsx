// The supervisor's interviewers: for the chosen project, each interviewer on its team with
// their assignment (completes to reach, cells to work) and completes so far; set or clear it;
// then each interviewer's rates, flags and back-checks.
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
      lead="Give each interviewer a number of completes to reach and, if you like, cells to work; see how far they have got, their rates, flags and back-checks."
    >
      <ChosenProjectView needs="The interviewers list" emptyNote="Once a project lead adds you to a project, its interviewers appear here.">
        {(project) => (
          <div key={project.id}>
            <ProjectInterviewers projectId={project.id} />
            <InterviewerRatesSection projectId={project.id} />
          </div>
        )}
      </ChosenProjectView>
    </PageFrame>
  );
}

function ProjectInterviewers({ projectId }: { projectId: string }) {
  const members = useMembers(projectId);
  return (
    <QueryView query={members} what="the team" offlineNote="The team needs the network." isEmpty={() => false} empty={null}>
      {(team) => <AssignmentsPanel projectId={projectId} interviewers={team.filter((m) => m.role === 'interviewer')} />}
    </QueryView>
  );
}
