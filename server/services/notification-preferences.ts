import {
  DEFAULT_DAYS_BEFORE,
  DEFAULT_REMINDER_HOUR,
  type NotificationPatch,
  type NotificationSettings,
} from '../../shared/schemas/notifications';
import { NotificationPreference, PushSubscription } from '../db/models';

export interface Preferences {
  emailReminders: boolean;
  weeklyDigest: boolean;
  reminderHour: number;
  daysBefore: number;
}

/**
 * How long after the reminder hour a missed reminder or digest is still sent (a sweep late after a restart): our own
 * rule, so a server back up at 10:30 pm wakes nobody; a reminder still due tomorrow goes out at tomorrow's hour.
 */
export const CATCH_UP_HOURS = 3;

export function withinReminderHours(hour: number, reminderHour: number): boolean {
  return hour >= reminderHour && hour < reminderHour + CATCH_UP_HOURS;
}

export const DEFAULT_PREFERENCES: Preferences = {
  emailReminders: true,
  weeklyDigest: true,
  reminderHour: DEFAULT_REMINDER_HOUR,
  daysBefore: DEFAULT_DAYS_BEFORE,
};

function pick(row: NotificationPreference | null | undefined): Preferences {
  if (!row) return { ...DEFAULT_PREFERENCES };
  return {
    emailReminders: row.emailReminders,
    weeklyDigest: row.weeklyDigest,
    reminderHour: row.reminderHour,
    daysBefore: row.daysBefore,
  };
}

/** Each person's preferences by user id, defaults filled in. */
export async function preferencesOf(userIds: string[]) {
  const rows = await NotificationPreference.findAll({ where: { userId: userIds } });
  return new Map(userIds.map((id) => [id, pick(rows.find((r) => r.userId === id))]));
}

export async function viewSettings(userId: string): Promise<NotificationSettings> {
  const [row, pushDevices] = await Promise.all([
    NotificationPreference.findByPk(userId),
    PushSubscription.count({ where: { userId } }),
  ]);
  return { ...pick(row), pushDevices };
}

const COLUMNS: Record<keyof NotificationPatch, string> = {
  emailReminders: 'email_reminders',
  weeklyDigest: 'weekly_digest',
  reminderHour: 'reminder_hour',
  daysBefore: 'days_before',
};

/** Writes only the fields in the patch, so two quick changes from one person never undo each other. */
export async function updateSettings(userId: string, patch: NotificationPatch) {
  const keys = (Object.keys(patch) as (keyof NotificationPatch)[]).filter((k) => patch[k] !== undefined);
  if (keys.length) {
    const columns = keys.map((k) => COLUMNS[k]);
    await NotificationPreference.sequelize!.query(
      `INSERT INTO notification_preferences (user_id, ${columns.join(', ')}, created_at, updated_at)
       VALUES (:userId, ${keys.map((k) => `:${k}`).join(', ')}, now(), now())
       ON CONFLICT (user_id) DO UPDATE SET ${columns.map((c) => `${c} = EXCLUDED.${c}`).join(', ')}, updated_at = now()`,
      { replacements: { userId, ...patch } },
    );
  }
  return viewSettings(userId);
}
