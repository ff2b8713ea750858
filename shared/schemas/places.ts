import { z } from 'zod';
import { LIMITS } from './limits';

const placeName = z
  .string({ error: 'Give the place a name.' })
  .trim()
  .min(1, 'Give the place a name.')
  .max(LIMITS.length.placeName, `Use at most ${LIMITS.length.placeName} characters.`)
  .refine((name) => !/[\p{Cc}\p{Cf}]/u.test(name), 'Use letters, digits and spaces, without control characters.');

export const placeBody = z.object({ name: placeName }).strict();
export type PlaceBody = z.infer<typeof placeBody>;

/** Removing a place: where its jars on hand go (another place, or null for no place), when it holds any. */
export const placeRemoveQuery = z.object({
  moveTo: z.union([z.uuid({ error: 'Choose a place from the list, or no place.' }), z.literal('none')]).optional(),
});

/** Jars moved together, to a place or to no place (null). */
export const jarMoveBody = z
  .object({
    jarIds: z
      .array(z.uuid({ error: 'A jar in the list was not found.' }), { error: 'Say which jars to move.' })
      .min(1, 'Choose at least one jar to move.')
      .max(LIMITS.jarsPerBatch, `Move at most ${LIMITS.jarsPerBatch} jars at a time.`),
    placeId: z.uuid({ error: 'Choose a place from the list, or no place.' }).nullable(),
  })
  .strict();
export type JarMoveBody = z.infer<typeof jarMoveBody>;

export interface PlaceView {
  id: string;
  name: string;
  /** Sealed jars kept there (an opened jar lives in the fridge). */
  sealedJars: number;
}

export interface JarsMoved {
  moved: number;
  placeId: string | null;
  placeName: string | null;
}
