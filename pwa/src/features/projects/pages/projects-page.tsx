import '../components/project-setup.css';
import { Link } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { useProjects } from '../../../lib/projects/get-projects';
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
    </PageFrame>
  );
}
