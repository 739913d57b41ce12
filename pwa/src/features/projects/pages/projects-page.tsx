import '../components/project-setup.css';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { useArchivedProjects, useProjects } from '../../../lib/projects/get-projects';
import { ProjectList } from '../components/project-list';

export function ProjectsPage() {
  const projects = useProjects();
  return (
    <PageFrame title="Projects" lead="The projects of your agency that you run, with their field dates and target sample.">
      <p className="pl-form-actions pl-projects-actions">
        <Link to="/lead/projects/new" className="pl-button pl-button-main pl-link-button">
          New project
        </Link>
      </p>
      <QueryView
        query={projects}
        what="projects"
        offlineNote="The project list needs the network. It will load as soon as you are back online."
        isEmpty={(list) => list.length === 0}
        empty={
          <EmptyPanel title="No projects yet">
            <p>Projects you set up or are given will be listed here.</p>
          </EmptyPanel>
        }
      >
        {(list) => <ProjectList projects={list} />}
      </QueryView>
      <ArchivedProjects />
    </PageFrame>
  );
}

/** Archived projects stay out of the list above; shown here on request, to open and restore. */
function ArchivedProjects() {
  const [shown, setShown] = useState(false);
  const archived = useArchivedProjects(shown);
  return (
    <section className="pl-section" aria-labelledby="pl-archived-heading">
      <h2 id="pl-archived-heading" className="pl-section-title">
        Archived
      </h2>
      <button type="button" className="pl-button pl-button-quiet pl-button-small" aria-expanded={shown} onClick={() => setShown(!shown)}>
        {shown ? 'Hide archived projects' : 'Show archived projects'}
      </button>
      {shown ? (
        <QueryView
          query={archived}
          what="archived projects"
          offlineNote="Archived projects need the network."
          isEmpty={(list) => list.length === 0}
          empty={<p className="pl-muted">No archived projects. A closed project can be archived from its page.</p>}
        >
          {(list) => <ProjectList projects={list} label="Archived projects" />}
        </QueryView>
      ) : null}
    </section>
  );
}
