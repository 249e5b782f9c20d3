import { useState } from 'react';
import { Badge, Button, HStack, Stack, Text } from '@chakra-ui/react';
import { isCatapultRole, ROLE_LABELS, type Role, type UserView } from '@catline/contracts';
import { ActionDialog } from '../../../components/action-dialog.js';
import { type Column, DataTable } from '../../../components/data-table.js';
import { PageHeader } from '../../../components/page-header.js';
import { Pager } from '../../../components/pager.js';
import { QueryView } from '../../../components/query-states.js';
import { NoticeBanner, refusalNotice, useNotice } from '../../../components/refusal-notice.js';
import { SelectInput } from '../../../components/select-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useShips } from '../../../lib/queries/ships-query.js';
import { useSquadrons } from '../../../lib/queries/squadrons-query.js';
import { useSessionUser } from '../../../lib/session-store.js';
import { useDeleteUser } from '../api/delete-user.js';
import { useUsersPage } from '../api/get-users.js';
import { useSendInvitation } from '../api/send-invitation.js';
import { useUpdateUser } from '../api/update-user.js';
import { roleChoices, UserForm } from './user-form.js';

export function PeopleScreen() {
  const me = useSessionUser();
  const [offset, setOffset] = useState(0);
  const users = useUsersPage(offset);
  const ships = useShips();
  const squadrons = useSquadrons();
  const update = useUpdateUser();
  const remove = useDeleteUser();
  const invite = useSendInvitation();
  const { notice, show, dismiss } = useNotice();
  const [doomed, setDoomed] = useState<UserView | null>(null);
  const catapults = ships.data?.flatMap((ship) => ship.catapults) ?? [];
  const catapultName = (id: number | null) => {
    const catapult = catapults.find((candidate) => candidate.id === id);
    return catapult ? `Cat ${catapult.number}` : '—';
  };
  const squadronCode = (id: number | null) => squadrons.data?.find((squadron) => squadron.id === id)?.code ?? '—';
  const refused = (error: unknown) => show(refusalNotice(error, 'The change'));
  // The list does not say who still has to choose a password: the server answers 409 for those who have one.
  const inviteAgain = (user: UserView) =>
    invite.mutate(user.id, {
      onSuccess: ({ message }) => show({ tone: 'done', title: `Invitation sent to ${user.name}`, message }),
      onError: (error) =>
        show({ tone: 'refused', title: `No invitation sent to ${user.name}`, message: errorMessage(error) }),
    });

  const columns: Column<UserView>[] = [
    {
      key: 'name',
      header: 'Name',
      cell: (user) => <Text fontWeight="600">{user.name}</Text>,
      sortValue: (user) => user.name,
    },
    { key: 'email', header: 'E-mail', cell: (user) => user.email, sortValue: (user) => user.email },
    {
      key: 'role',
      header: 'Role',
      cell: (user) =>
        user.id === me.id ? (
          ROLE_LABELS[user.role]
        ) : (
          <SelectInput
            minW="10rem"
            ariaLabel={`Role of ${user.name}`}
            value={user.role}
            choices={roleChoices}
            onChange={(role) => update.mutate({ id: user.id, role: role as Role }, { onError: refused })}
          />
        ),
      sortValue: (user) => ROLE_LABELS[user.role],
    },
    {
      key: 'assignment',
      header: 'Catapult / squadron',
      cell: (user) =>
        isCatapultRole(user.role) ? (
          <SelectInput
            minW="7rem"
            ariaLabel={`Catapult of ${user.name}`}
            value={user.catapultId === null ? '' : String(user.catapultId)}
            placeholder="None"
            choices={catapults.map((catapult) => ({ value: String(catapult.id), label: `Cat ${catapult.number}` }))}
            onChange={(value) =>
              update.mutate({ id: user.id, catapultId: value ? Number(value) : null }, { onError: refused })
            }
          />
        ) : user.role === 'pilot' ? (
          squadronCode(user.squadronId)
        ) : (
          '—'
        ),
      sortValue: (user) => (isCatapultRole(user.role) ? catapultName(user.catapultId) : squadronCode(user.squadronId)),
    },
    {
      key: 'active',
      header: 'Access',
      cell: (user) => <Badge colorPalette={user.active ? 'go' : 'gray'}>{user.active ? 'Active' : 'Blocked'}</Badge>,
      sortValue: (user) => (user.active ? 'active' : 'blocked'),
    },
    {
      key: 'actions',
      header: 'Actions',
      cell: (user) =>
        user.id === me.id ? (
          <Text fontSize="sm" color="fg.muted">
            You
          </Text>
        ) : (
          <HStack gap="1">
            <Button
              size="xs"
              variant="outline"
              onClick={() => update.mutate({ id: user.id, active: !user.active }, { onError: refused })}
            >
              {user.active ? 'Block' : 'Unblock'}
            </Button>
            {user.active && (
              <Button
                size="xs"
                variant="outline"
                onClick={() => inviteAgain(user)}
                loading={invite.isPending && invite.variables === user.id}
              >
                Send invitation again
              </Button>
            )}
            <Button size="xs" variant="ghost" colorPalette="nogo" onClick={() => setDoomed(user)}>
              Delete
            </Button>
          </HStack>
        ),
    },
  ];

  return (
    <Stack gap="4">
      <PageHeader title="People" subtitle="Sign-ins and roles" />
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      <QueryView query={users} loadingLabel="Loading people…">
        {(page) => (
          <Stack gap="2">
            <DataTable
              caption="People"
              rows={page.items}
              columns={columns}
              rowKey={(user) => user.id}
              emptyTitle="No people yet"
              initialSort={{ key: 'name' }}
            />
            <Pager page={page} onOffset={setOffset} />
          </Stack>
        )}
      </QueryView>
      <Stack gap="2" borderWidth="1px" rounded="card" p="3">
        <Text fontWeight="700">Add a person</Text>
        <UserForm squadrons={squadrons.data ?? []} />
      </Stack>
      {doomed && (
        <ActionDialog
          open
          title={`Delete ${doomed.name}?`}
          onClose={() => setDoomed(null)}
          confirmLabel="Delete"
          tone="nogo"
          pending={remove.isPending}
          onConfirm={() => remove.mutate(doomed.id, { onSettled: () => setDoomed(null), onError: refused })}
        >
          <Text>They are signed out everywhere at once and can no longer sign in.</Text>
        </ActionDialog>
      )}
    </Stack>
  );
}
