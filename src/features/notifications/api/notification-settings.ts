import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { NotificationPatch, NotificationSettings } from '@shared/schemas/notifications';
import { api } from '@/lib/api-client';
import { useOptimisticCache } from '@/lib/optimistic';
import { notificationKeys } from '@/lib/query-keys';

export const getNotificationSettings = () =>
  api.get<{ settings: NotificationSettings }>('/me/notifications').then((r) => r.settings);

export const notificationSettingsQueryOptions = () =>
  queryOptions({ queryKey: notificationKeys.settings, queryFn: getNotificationSettings });

export const useNotificationSettings = () => useQuery(notificationSettingsQueryOptions());

export const updateNotificationSettings = (patch: NotificationPatch) =>
  api.patch<{ settings: NotificationSettings }>('/me/notifications', patch).then((r) => r.settings);

const SAVE_SETTINGS = [...notificationKeys.settings, 'save'] as const;

export function useUpdateNotificationSettings() {
  const queryClient = useQueryClient();
  const optimistic = useOptimisticCache<NotificationSettings, NotificationPatch>({
    key: notificationKeys.settings,
    edit: (settings, patch) => ({ ...settings, ...patch }),
  });
  return useMutation({
    mutationKey: SAVE_SETTINGS,
    mutationFn: updateNotificationSettings,
    // The choice shows at once; a refusal puts the saved settings back.
    ...optimistic,
    // Only the last save in flight writes the server's answer: an earlier one's would undo a later choice on screen.
    onSuccess: (settings) => {
      if (queryClient.isMutating({ mutationKey: SAVE_SETTINGS }) === 1)
        queryClient.setQueryData(notificationKeys.settings, settings);
    },
  });
}
