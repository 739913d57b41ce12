import { useId } from 'react';
import type { Project } from '../lib/projects/get-projects';

interface ProjectPickerProps {
  projects: Project[];
  value: string;
  onChange: (id: string) => void;
}

/** Choose among several projects; with one project it only names it. */
export function ProjectPicker({ projects, value, onChange }: ProjectPickerProps) {
  const id = useId();
  if (projects.length < 2) {
    return <p className="pl-project-name">{projects[0]?.name}</p>;
  }
  return (
    <div className="pl-project-picker">
      <label htmlFor={id}>Project</label>
      <select id={id} className="pl-select" value={value} onChange={(event) => onChange(event.target.value)}>
        {projects.map((project) => (
          <option key={project.id} value={project.id}>
            {project.name}
          </option>
        ))}
      </select>
    </div>
  );
}
