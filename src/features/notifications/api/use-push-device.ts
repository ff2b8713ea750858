import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  currentSubscription,
  pushSupported,
  sendTestNotification,
  subscribeThisDevice,
  unsubscribeThisDevice,
} from './push-device';
import { notificationKeys } from '@/lib/query-keys';

/** This browser's push subscription, and the actions that change it. */
export function usePushDevice() {
  const queryClient = useQueryClient();
  const supported = pushSupported();
  const subscription = useQuery({
    queryKey: notificationKeys.thisDevice,
    queryFn: currentSubscription,
    enabled: supported,
  });
  const refresh = () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: notificationKeys.thisDevice }),
      queryClient.invalidateQueries({ queryKey: notificationKeys.settings }),
    ]);
  const subscribe = useMutation({ mutationFn: subscribeThisDevice, onSettled: refresh });
  const unsubscribe = useMutation({ mutationFn: unsubscribeThisDevice, onSettled: refresh });
  const test = useMutation({ mutationFn: sendTestNotification, onSettled: refresh });
  return {
    supported,
    subscribed: Boolean(subscription.data),
    checking: subscription.isPending && supported,
    subscribe,
    unsubscribe,
    test,
  };
}
