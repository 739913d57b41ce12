import { useState } from 'react';
import { formatCalendarDate, formatCount } from '../../../lib/format';
import type { Project } from '../../../lib/projects/get-projects';
import { useUpdateProject } from '../api/update-project';
import { DuplicateProject } from './duplicate-project';
import { ProjectFactsForm } from './project-facts-form';

/** The project's facts, and a form to change them (the lead can, at any stage). */
export function ProjectDetails({ project }: { project: Project }) {
  const [editing, setEditing] = useState(false);
  const [saved, setSaved] = useState(false);
  const update = useUpdateProject(project.id);
  if (editing) {
    return (
      <ProjectFactsForm
        initial={{
          name: project.name,
          topic: project.topic ?? '',
          fieldStart: project.fieldStart ?? '',
          fieldEnd: project.fieldEnd ?? '',
          targetSize: String(project.targetSize),
          headlineQuestion: project.headlineQuestion ?? '',
          timeZone: project.timeZone ?? 'UTC',
        }}
        submitLabel="Save details"
        busyLabel="Saving…"
        busy={update.isPending}
        error={update.error}
        note={
          <p className="pl-form-note">
            A new sample size recomputes the cell targets; a new time zone moves interviews already logged to that zone’s
            field days. Interviews are never lost by a change here.
          </p>
        }
        actions={
          <button
            type="button"
            className="pl-button pl-button-quiet"
            onClick={() => {
              update.reset();
              setEditing(false);
            }}
          >
            Cancel
          </button>
        }
        onSubmit={(changes) =>
          update.mutate(changes, {
            onSuccess: () => {
              setEditing(false);
              setSaved(true);
            },
          })
        }
      />
    );
  }
  return (
    <>
      <dl className="pl-facts">
        <div>
          <dt>Field dates</dt>
          <dd>
            {project.fieldStart && project.fieldEnd
              ? `${formatCalendarDate(project.fieldStart)} – ${formatCalendarDate(project.fieldEnd)}`
              : 'Not set'}
          </dd>
        </div>
        <div>
          <dt>Target sample</dt>
          <dd>
            <span className="pl-figure">{formatCount(project.targetSize)}</span> interviews
          </dd>
        </div>
        {project.timeZone ? (
          <div>
            <dt>Time zone</dt>
            <dd>{project.timeZone.replaceAll('_', ' ')}</dd>
          </div>
        ) : null}
        {project.headlineQuestion ? (
          <div>
            <dt>Headline question</dt>
            <dd>{project.headlineQuestion}</dd>
          </div>
        ) : null}
      </dl>
      {saved ? (
        <p className="pl-saved" role="status">
          Details saved.
        </p>
      ) : null}
      <div className="pl-form-actions">
        <button
          type="button"
          className="pl-button pl-button-quiet pl-button-small"
          onClick={() => {
            setSaved(false);
            setEditing(true);
          }}
        >
          Edit details
        </button>
        <DuplicateProject project={project} />
      </div>
    </>
  );
}
