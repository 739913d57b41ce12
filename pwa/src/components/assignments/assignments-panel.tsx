// Per-interviewer assignments on one project, for the lead (the project's team section) and
// the supervisor (the interviewers page): each interviewer on the team with their target of
// completes, their completes so far and the cells they were given; set, change or clear.
import './assignments.css';
import { useState } from 'react';
import { useAssignments, type Assignment } from '../../lib/assignments/get-assignments';
import { useChangeAssignment } from '../../lib/assignments/set-assignment';
import { formatCount } from '../../lib/format';
import { useCells, type ProjectCell } from '../../lib/projects/get-cells';
import { FormProblem } from '../form-problem';
import { QueryView } from '../query-view';
import { AssignmentForm } from './assignment-form';

export interface Interviewer {
  id: string;
  name: string;
}

interface AssignmentsPanelProps {
  projectId: string;
  interviewers: Interviewer[];
  /** An archived project is read-only. */
  readOnly?: boolean;
}

export function AssignmentsPanel({ projectId, interviewers, readOnly = false }: AssignmentsPanelProps) {
  const assignments = useAssignments(projectId);
  const cells = useCells(projectId);
  if (interviewers.length === 0) {
    return <p className="pl-small pl-muted">No interviewers on the team yet: add some to give them assignments.</p>;
  }
  return (
    <QueryView query={assignments} what="assignments" offlineNote="Assignments need the network." isEmpty={() => false} empty={null}>
      {(list) => (
        <ul className="pl-assign-list" aria-label="Assignments">
          {interviewers.map((person) => (
            <AssignmentRow
              key={person.id}
              projectId={projectId}
              person={person}
              assignment={list.find((a) => a.userId === person.id)}
              cells={cells.data?.cells ?? []}
              readOnly={readOnly}
            />
          ))}
        </ul>
      )}
    </QueryView>
  );
}

interface RowProps {
  projectId: string;
  person: Interviewer;
  assignment: Assignment | undefined;
  cells: ProjectCell[];
  readOnly: boolean;
}

function AssignmentRow({ projectId, person, assignment, cells, readOnly }: RowProps) {
  const change = useChangeAssignment(projectId);
  const [editing, setEditing] = useState(false);
  const labels = new Map(cells.map((c) => [c.id, c.label]));
  return (
    <li className="pl-assign-row">
      <p className="pl-assign-name">{person.name}</p>
      {assignment ? (
        <p className="pl-small">
          <span className="pl-figure">{formatCount(assignment.completes)}</span> of <span className="pl-figure">{formatCount(assignment.target)}</span> completes;{' '}
          {assignment.cellIds.length === 0 ? 'any cell' : `cells: ${assignment.cellIds.map((id) => labels.get(id) ?? 'a cell').join('; ')}`}
        </p>
      ) : (
        <p className="pl-small pl-muted">No assignment: works any cell, no target of their own.</p>
      )}
      {editing ? (
        <AssignmentForm
          person={person}
          assignment={assignment}
          cells={cells}
          busy={change.isPending}
          problem={change.error?.message}
          onCancel={() => {
            setEditing(false);
            change.reset();
          }}
          onSave={(value) => change.mutate({ userId: person.id, assignment: value }, { onSuccess: () => setEditing(false) })}
        />
      ) : readOnly ? null : (
        <div className="pl-form-actions">
          <button type="button" className="pl-button pl-button-small" onClick={() => setEditing(true)} aria-label={`${assignment ? 'Change' : 'Set'} the assignment of ${person.name}`}>
            {assignment ? 'Change' : 'Set assignment'}
          </button>
          {assignment ? (
            <button
              type="button"
              className="pl-button pl-button-quiet pl-button-small"
              disabled={change.isPending}
              onClick={() => change.mutate({ userId: person.id, assignment: null })}
              aria-label={`Clear the assignment of ${person.name}`}
            >
              Clear
            </button>
          ) : null}
        </div>
      )}
      {!editing ? <FormProblem message={change.error?.message} /> : null}
    </li>
  );
}
