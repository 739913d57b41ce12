import { useState } from 'react';
import { PageFrame } from '../../../components/page-frame';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { useStoredSession } from '../../../db/session-store';
import { useUsers, type OrganisationUser } from '../../../lib/users/get-users';
import { InviteDialog } from '../components/invite-dialog';
import { PeopleList } from '../components/people-list';
import { PersonDialog } from '../components/person-dialog';
import '../people.css';

export function PeoplePage() {
  const users = useUsers();
  const session = useStoredSession();
  const [inviting, setInviting] = useState(false);
  const [managing, setManaging] = useState<OrganisationUser | null>(null);
  const [note, setNote] = useState<string | null>(null);
  // The dialog shows the freshest copy of the person once the list has been re-read.
  const current = managing && (users.data?.find((p) => p.id === managing.id) ?? managing);

  return (
    <PageFrame title="People" lead="Everyone with an account in your organisation, and their role.">
      <div className="pl-people-toolbar">
        <button type="button" className="pl-button pl-button-main" onClick={() => { setNote(null); setInviting(true); }}>
          Invite a person
        </button>
      </div>
      {note ? (
        <p className="pl-form-note" role="status">
          {note}
        </p>
      ) : null}
      <QueryView
        query={users}
        what="people"
        offlineNote="The list of people needs the network. It will load as soon as you are back online."
        isEmpty={(list) => list.length === 0}
        empty={
          <EmptyPanel title="No accounts yet">
            <p>Accounts in your organisation will be listed here.</p>
          </EmptyPanel>
        }
      >
        {(list) => <PeopleList people={list} selfId={session?.user.id} onManage={setManaging} />}
      </QueryView>
      {inviting ? (
        <InviteDialog
          onClose={() => setInviting(false)}
          onInvited={(email) => {
            setInviting(false);
            setNote(`Invitation sent to ${email}. They choose their own password through the link in it.`);
          }}
        />
      ) : null}
      {current ? <PersonDialog person={current} onClose={() => setManaging(null)} /> : null}
    </PageFrame>
  );
}
