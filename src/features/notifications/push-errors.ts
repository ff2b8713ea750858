import { ApiError } from '@/lib/api-client';

export const PUSH_BROWSERS =
  'Push works in current Chrome, Edge and Firefox on a computer or an Android phone, and in Safari 16.4 or later on an iPhone or iPad once Larderly is added to the home screen (Share, then Add to Home Screen).';

export const ALLOW_NOTIFICATIONS =
  'Notifications are blocked for Larderly in this browser. To allow them, tap the lock or site-settings icon beside the address, set Notifications to Allow (on an iPhone: Settings, then Notifications, then Larderly), then tap Turn on again.';

/** Why turning push on failed, in what to do next, never the browser's own wording. */
export class PushSetupError extends Error {
  constructor(
    readonly reason: 'blocked' | 'dismissed' | 'unsupported' | 'network' | 'server' | 'unknown',
    message: string,
  ) {
    super(message);
  }
}

export function pushSetupError(cause: unknown): PushSetupError {
  if (cause instanceof PushSetupError) return cause;
  if (cause instanceof ApiError) {
    return cause.status === 0
      ? new PushSetupError(
          'network',
          'Larderly could not be reached to save this device. Check your connection and try again.',
        )
      : new PushSetupError('server', cause.message);
  }
  const name = cause instanceof Error || cause instanceof DOMException ? cause.name : '';
  const text = cause instanceof Error || cause instanceof DOMException ? cause.message : '';
  if (name === 'NotAllowedError' || /permission/i.test(text)) return new PushSetupError('blocked', ALLOW_NOTIFICATIONS);
  if (name === 'NotSupportedError' || name === 'SecurityError' || /not supported|unsupported|insecure/i.test(text)) {
    return new PushSetupError('unsupported', `This browser cannot receive push notifications. ${PUSH_BROWSERS}`);
  }
  if (
    name === 'AbortError' ||
    name === 'NetworkError' ||
    name === 'TypeError' ||
    /push service|network|timed? ?out/i.test(text)
  ) {
    return new PushSetupError(
      'network',
      'The browser’s push service could not be reached. Check your connection and try again in a minute.',
    );
  }
  return new PushSetupError(
    'unknown',
    'Notifications could not be turned on for this device. Try again; if it keeps failing, use e-mail reminders (Household, Notifications) instead.',
  );
}
