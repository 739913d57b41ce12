import '../components/project-setup.css';
import { Link, useParams } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { QueryView } from '../../../components/query-view';
import { rememberProject } from '../../../lib/projects/chosen-project';
import { useProject } from '../api/get-project';
import { ProjectDetails } from '../components/project-details';
import { QualitySection } from '../components/quality-section';
import { StatusControl } from '../components/status-control';
import { TargetsSection } from '../components/targets-section';
import { TeamSection } from '../components/team-section';

/** One project, for its lead: stage, quota targets and cells, and the team. */
export function ProjectPage() {
  const { projectId = '' } = useParams();
  const project = useProject(projectId);
  return (
    <PageFrame title={project.data?.name ?? 'Project'}>
      <p>
        <Link to="/lead" className="pl-back-link">
          ← All projects
        </Link>
      </p>
      <QueryView query={project} what="the project" offlineNote="The project needs the network. It will load as soon as you are back online." isEmpty={() => false} empty={null}>
        {(p) => (
          <>
            {p.topic ? <p className="pl-page-lead">{p.topic}</p> : null}
            {p.archivedAt ? (
              <p className="pl-form-note" role="status">
                This project is archived: hidden from lists and interviewers’ phones, and kept read-only. Restore it under Stage to change anything.
              </p>
            ) : null}
            <section className="pl-section" aria-labelledby="pl-details-heading">
              <h2 id="pl-details-heading" className="pl-section-title">Details</h2>
              <ProjectDetails project={p} />
            </section>
            <p className="pl-project-links">
              <Link to={`/lead/projects/${p.id}/quota-board`} className="pl-back-link">
                Quota board →
              </Link>
              <Link to={`/lead/projects/${p.id}/review`} className="pl-back-link">
                Review queue →
              </Link>
              <Link to={`/lead/projects/${p.id}/interviewers`} className="pl-back-link">
                Interviewers →
              </Link>
              <Link to="/lead/balance" className="pl-back-link" onClick={() => rememberProject(p.id)}>
                Balance →
              </Link>
              <Link to={`/lead/projects/${p.id}/projection`} className="pl-back-link">
                Projection →
              </Link>
            </p>
            <section className="pl-section" aria-labelledby="pl-stage-heading">
              <h2 id="pl-stage-heading" className="pl-section-title">Stage</h2>
              <StatusControl project={p} />
            </section>
            <section className="pl-section" aria-labelledby="pl-targets-heading">
              <h2 id="pl-targets-heading" className="pl-section-title">Quota targets</h2>
              <TargetsSection project={p} />
            </section>
            <section className="pl-section" aria-labelledby="pl-team-heading">
              <h2 id="pl-team-heading" className="pl-section-title">Team</h2>
              <TeamSection projectId={p.id} readOnly={p.archivedAt !== null} />
            </section>
            <section className="pl-section" aria-labelledby="pl-quality-heading">
              <h2 id="pl-quality-heading" className="pl-section-title">Quality rules</h2>
              <QualitySection projectId={p.id} readOnly={p.archivedAt !== null} />
            </section>
          </>
        )}
      </QueryView>
    </PageFrame>
  );
}
