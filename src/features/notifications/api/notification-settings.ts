import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { NotificationPatch, NotificationSettings } from '@shared/schemas/notifications';
import { api } from '@/lib/api-client';

export const notificationKeys = { settings: ['me', 'notifications'] as const };

export const getNotificationSettings = () => api.get<{ settings: NotificationSettings }>('/me/notifications').then((r) => r.settings);

export const notificationSettingsQueryOptions = () => queryOptions({ queryKey: notificationKeys.settings, queryFn: getNotificationSettings });

export const useNotificationSettings = () => useQuery(notificationSettingsQueryOptions());

export const updateNotificationSettings = (patch: NotificationPatch) => api.patch<{ settings: NotificationSettings }>('/me/notifications', patch).then((r) => r.settings);

export function useUpdateNotificationSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateNotificationSettings,
    // The choice shows at once; a refusal puts the saved settings back.
    onMutate: async (patch: NotificationPatch) => {
      await queryClient.cancelQueries({ queryKey: notificationKeys.settings });
      const before = queryClient.getQueryData<NotificationSettings>(notificationKeys.settings);
      if (before) queryClient.setQueryData(notificationKeys.settings, { ...before, ...patch });
      return { before };
    },
    onError: (_error, _patch, context) => {
      if (context?.before) queryClient.setQueryData(notificationKeys.settings, context.before);
    },
    onSuccess: (settings) => queryClient.setQueryData(notificationKeys.settings, settings),
  });
}
