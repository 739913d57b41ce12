import { Link } from 'react-router-dom';
import { formatCalendarDate, formatCount } from '../../../lib/format';
import type { Project } from '../../../lib/projects/get-projects';

const statusWords: Record<string, string> = {
  draft: 'Being set up',
  setup: 'Being set up',
  fieldwork: 'In the field',
  active: 'In the field',
  closed: 'Field closed',
  delivered: 'Delivered',
};

export function ProjectList({ projects, label = 'Projects' }: { projects: Project[]; label?: string }) {
  return (
    <ul className="pl-card-list" aria-label={label}>
      {projects.map((project) => (
        <li key={project.id} className="pl-card">
          <div className="pl-card-head">
            <h2 className="pl-card-title">
              <Link to={`/lead/projects/${project.id}`} className="pl-card-link">
                {project.name}
              </Link>
            </h2>
            <span className="pl-tag">{project.archivedAt ? 'Archived' : (statusWords[project.status] ?? project.status)}</span>
          </div>
          <p className="pl-card-text">{project.topic}</p>
          <dl className="pl-facts">
            <div>
              <dt>Field dates</dt>
              <dd>
                {formatCalendarDate(project.fieldStart)} – {formatCalendarDate(project.fieldEnd)}
              </dd>
            </div>
            <div>
              <dt>Target sample</dt>
              <dd>
                <span className="pl-figure">{formatCount(project.targetSize)}</span> interviews
              </dd>
            </div>
          </dl>
        </li>
      ))}
    </ul>
  );
}
