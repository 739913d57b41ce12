import { PageFrame } from '../../../components/page-frame';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { useUsers } from '../../../lib/users/get-users';
import { PeopleList } from '../components/people-list';

export function PeoplePage() {
  const users = useUsers();
  return (
    <PageFrame title="People" lead="Everyone with an account in your organisation, and their role.">
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
        {(list) => <PeopleList people={list} />}
      </QueryView>
    </PageFrame>
  );
}
