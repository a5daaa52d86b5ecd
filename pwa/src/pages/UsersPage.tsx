import { useState } from 'react';
import { IonButton } from '@ionic/react';
import { useQuery } from '@tanstack/react-query';
import type { Role } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { PageShell } from '../components/PageShell';
import { CreateUserForm } from '../components/users/CreateUserForm';
import { InviteUserForm } from '../components/users/InviteUserForm';
import { UserRow } from '../components/users/UserRow';
import { useApiClient } from '../features/api/ApiClientContext';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { useSession } from '../features/session/SessionProvider';
import { usersListQuery } from '../features/users/usersApi';
import { useUpdateUser } from '../features/users/useUserMutations';

/** The admin's user management: list, add, change role, deactivate. */
export default function UsersPage() {
  const { t } = useTranslation();
  const client = useApiClient();
  const online = useOnlineStatus();
  const { session } = useSession();
  const users = useQuery({ ...usersListQuery(client), enabled: online });
  const update = useUpdateUser();
  const [updateError, setUpdateError] = useState<string>();

  function change(id: string, name: string, input: { role?: Role; active?: boolean }) {
    setUpdateError(undefined);
    update.mutate(
      { id, input },
      { onError: (error) => setUpdateError(t('pages.users.updateError', { name, message: error.message })) },
    );
  }

  return (
    <PageShell title={t('pages.users.title')}>
      <section className="sb-panel" aria-labelledby="users-heading">
        <h2 id="users-heading" className="sb-panel__heading">
          {t('pages.users.listHeading')}
        </h2>
        {!online && !users.data && <p className="sb-notice">{t('pages.users.offline')}</p>}
        {users.isPending && online && <p className="sb-muted">{t('pages.users.loading')}</p>}
        {users.isError && (
          <div className="sb-error" role="alert">
            <p>{t('pages.users.loadError', { message: users.error.message })}</p>
            <IonButton fill="outline" onClick={() => void users.refetch()}>
              {t('pages.users.retry')}
            </IonButton>
          </div>
        )}
        {updateError && (
          <p className="sb-error" role="alert">
            {updateError}
          </p>
        )}
        {users.data && users.data.length === 0 && <p>{t('pages.users.empty')}</p>}
        {users.data && users.data.length > 0 && (
          <div className="sb-table-wrap">
            <table className="sb-table">
              <thead>
                <tr>
                  <th scope="col">{t('pages.users.colName')}</th>
                  <th scope="col">{t('pages.users.colRole')}</th>
                  <th scope="col">{t('pages.users.colStatus')}</th>
                  <th scope="col">{t('pages.users.colAction')}</th>
                </tr>
              </thead>
              <tbody>
                {users.data.map((user) => (
                  <UserRow
                    key={user.id}
                    user={user}
                    isSelf={String(user.id) === String(session?.user.id)}
                    busy={update.isPending && update.variables?.id === user.id}
                    onChange={(input) => change(user.id, user.displayName, input)}
                  />
                ))}
              </tbody>
            </table>
          </div>
        )}
        {users.data?.some((u) => String(u.id) === String(session?.user.id)) && (
          <p className="sb-muted">{t('pages.users.selfHint')}</p>
        )}
      </section>
      <section className="sb-panel" aria-labelledby="invite-user-heading">
        <h2 id="invite-user-heading" className="sb-panel__heading">
          {t('invite.heading')}
        </h2>
        <p className="sb-muted">{t('invite.intro')}</p>
        <InviteUserForm />
      </section>
      <section className="sb-panel" aria-labelledby="create-user-heading">
        <h2 id="create-user-heading" className="sb-panel__heading">
          {t('pages.users.createHeading')}
        </h2>
        <p className="sb-muted">{t('pages.users.createIntro')}</p>
        <CreateUserForm />
      </section>
    </PageShell>
  );
}
