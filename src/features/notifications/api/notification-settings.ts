import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { NotificationPatch, NotificationSettings } from '@shared/schemas/notifications';
import { api } from '@/lib/api-client';
import { useOptimisticCache } from '@/lib/optimistic';
import { notificationKeys } from '@/lib/query-keys';

export const getNotificationSettings = () => api.get<{ settings: NotificationSettings }>('/me/notifications').then((r) => r.settings);

export const notificationSettingsQueryOptions = () => queryOptions({ queryKey: notificationKeys.settings, queryFn: getNotificationSettings });

export const useNotificationSettings = () => useQuery(notificationSettingsQueryOptions());

export const updateNotificationSettings = (patch: NotificationPatch) => api.patch<{ settings: NotificationSettings }>('/me/notifications', patch).then((r) => r.settings);

export function useUpdateNotificationSettings() {
  const queryClient = useQueryClient();
  const optimistic = useOptimisticCache<NotificationSettings, NotificationPatch>({ key: notificationKeys.settings, edit: (settings, patch) => ({ ...settings, ...patch }) });
  return useMutation({
    mutationFn: updateNotificationSettings,
    // The choice shows at once; a refusal puts the saved settings back.
    ...optimistic,
    onSuccess: (settings) => queryClient.setQueryData(notificationKeys.settings, settings),
  });
}
