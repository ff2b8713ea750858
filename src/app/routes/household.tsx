import { can } from '@shared/roles';
import { Card, PageHeader } from '@/components/ui/page';
import { useHousehold, useMembers } from '@/features/households/api/get-household';
import { HouseholdSettingsForm } from '@/features/households/components/household-settings-form';
import { MemberList } from '@/features/households/components/member-list';
import { BackupPanel } from '@/features/backup/components/backup-panel';
import { CalendarPanel } from '@/features/calendar';
import { InvitationPanel } from '@/features/invitations/components/invitation-panel';
import { NotificationSettingsPanel } from '@/features/notifications/components/notification-settings';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { PlacesPanel } from '@/features/shelf/components/places-panel';

const ROLE_NOTES = {
  keeper: 'As a keeper you manage members, roles and the household settings.',
  cook: 'As a cook you plan the week and record batches; a keeper manages these settings.',
  helper: 'As a helper you can open, finish and discard jars and tick to-dos; a keeper manages these settings.',
} as const;

export function HouseholdRoute() {
  const { hid, role, me } = useCurrentHousehold();
  const household = useHousehold(hid);
  const members = useMembers(hid);
  const canManage = can(role, 'manage');

  return (
    <>
      <PageHeader title="Household" lead={role ? ROLE_NOTES[role] : undefined} />
      <div className="grid gap-5 *:min-w-0 lg:grid-cols-[3fr_2fr]">
        <Card>
          <h2 className="mb-4 text-xl">Settings</h2>
          {household.data ? (
            <HouseholdSettingsForm key={household.data.id} household={household.data} canEdit={canManage} />
          ) : (
            <p className="text-ink-muted">Loading…</p>
          )}
        </Card>
        <Card>
          <h2 className="mb-2 text-xl">Members</h2>
          {members.data && me ? (
            <MemberList hid={hid} members={members.data} canManage={canManage} myId={me.user.id} />
          ) : (
            <p className="text-ink-muted">Loading…</p>
          )}
        </Card>
        <Card>
          <h2 className="mb-1 text-xl">Shelf places</h2>
          <p className="mb-4 text-ink-muted">
            Where the household keeps its jars. A product can have a usual place; the shelf and Today say where each jar
            is.
          </p>
          <PlacesPanel hid={hid} canCook={can(role, 'cook')} />
        </Card>
        <Card>
          <h2 className="mb-1 text-xl">Notifications</h2>
          <p className="mb-4 text-ink-muted">
            Yours alone: a reminder before an opened jar reaches its use-by, by push on this device or by e-mail.
          </p>
          <NotificationSettingsPanel />
        </Card>
        <Card>
          <h2 className="mb-1 text-xl">Calendar</h2>
          <p className="mb-4 text-ink-muted">
            Yours alone: the planned meals, the use-by dates of opened jars and the to-dos with a due date, in the
            calendar app you already use.
          </p>
          <CalendarPanel hid={hid} canManage={canManage} />
        </Card>
        {canManage && (
          <Card>
            <h2 className="mb-4 text-xl">Invitations</h2>
            <InvitationPanel hid={hid} />
          </Card>
        )}
        {canManage && (
          <Card>
            <h2 className="mb-4 text-xl">Export / Import</h2>
            <BackupPanel hid={hid} />
          </Card>
        )}
      </div>
    </>
  );
}
