import { useState } from 'react';
import { QueryView } from '../../../components/query-view';
import type { Role } from '../../../config/roles';
import { useUsers, type OrganisationUser } from '../../../lib/users/get-users';
import { useMembers, type Member } from '../api/get-members';
import { useSetMembers } from '../api/set-members';
import { FormProblem } from '../../../components/form-problem';
import { AssignmentsPanel } from '../../../components/assignments/assignments-panel';

const groups: { role: Role; title: string }[] = [
  { role: 'interviewer', title: 'Interviewers' },
  { role: 'supervisor', title: 'Supervisors' },
  { role: 'client', title: 'Clients' },
];

/** Who works on (or may read) the project: a checklist of the agency's people by role, then each interviewer's assignment. */
export function TeamSection({ projectId, readOnly = false }: { projectId: string; readOnly?: boolean }) {
  const users = useUsers();
  const members = useMembers(projectId);
  return (
    <QueryView query={users} what="people" offlineNote="The team needs the network." isEmpty={() => false} empty={null}>
      {(people) => (
        <QueryView query={members} what="the team" offlineNote="The team needs the network." isEmpty={() => false} empty={null}>
          {(current) => (
            <>
              <TeamChecklist projectId={projectId} people={people} members={current} />
              <h3 className="pl-subsection-title">Assignments</h3>
              <p className="pl-small pl-muted">Optional: completes each interviewer should reach and, if you like, the cells they should work. Their Today page shows how they stand.</p>
              <AssignmentsPanel projectId={projectId} interviewers={current.filter((m) => m.role === 'interviewer')} readOnly={readOnly} />
            </>
          )}
        </QueryView>
      )}
    </QueryView>
  );
}

function TeamChecklist({ projectId, people, members }: { projectId: string; people: OrganisationUser[]; members: Member[] }) {
  const setMembers = useSetMembers(projectId);
  const [chosen, setChosen] = useState(() => new Set(members.map((m) => m.id)));
  const [saved, setSaved] = useState(false);
  const toggle = (id: string) => {
    const next = new Set(chosen);
    if (next.has(id)) next.delete(id);
    else next.add(id);
    setChosen(next);
    setSaved(false);
  };

  return (
    <div>
      <div className="pl-team-groups">
        {groups.map((group) => {
          const inGroup = people.filter((p) => p.role === group.role).sort((a, b) => a.name.localeCompare(b.name));
          return (
            <fieldset key={group.role} className="pl-team-group">
              <legend>
                {group.title} <span className="pl-muted pl-small">({inGroup.filter((p) => chosen.has(p.id)).length} of {inGroup.length})</span>
              </legend>
              {inGroup.length === 0 ? <p className="pl-small pl-muted">No {group.title.toLowerCase()} in the agency yet.</p> : null}
              {inGroup.map((person) => (
                <label key={person.id} className="pl-check">
                  <input type="checkbox" checked={chosen.has(person.id)} onChange={() => toggle(person.id)} />
                  {person.name}
                </label>
              ))}
            </fieldset>
          );
        })}
      </div>
      <FormProblem message={setMembers.error?.message} />
      <div className="pl-form-actions">
        <button
          type="button"
          className="pl-button pl-button-main"
          disabled={setMembers.isPending}
          onClick={() => setMembers.mutate([...chosen], { onSuccess: () => setSaved(true) })}
        >
          {setMembers.isPending ? 'Saving…' : 'Save team'}
        </button>
      </div>
      {saved ? (
        <p className="pl-saved" role="status">
          Team saved.
        </p>
      ) : null}
    </div>
  );
}
