import type { QueryInterface } from 'sequelize';

/**
 * A to-do's change and its move in the list, in one statement: the list's advisory lock (db/advisory-locks.ts),
 * the checks and the renumbering all run here, so a busy list holds its lock for the statement alone instead of
 * across several round trips through the app's event loop (every other writer of the list waits that long).
 *
 * Returns 'changed', 'unchanged', 'missing' (no such to-do in the household) or 'not a member' (the assignee).
 * `fields` holds only the keys the change gives: title, notes, dueOn, assigneeId (null unassigns).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`
    CREATE FUNCTION todo_list_update(list_lock bigint, household uuid, todo uuid, fields jsonb, new_done boolean,
                                     new_position integer) RETURNS text LANGUAGE plpgsql AS $$
    DECLARE
      stored todos;
      changed_row todos;
      ids uuid[];
      target integer;
      moved integer := 0;
    BEGIN
      PERFORM pg_advisory_xact_lock(list_lock);
      -- A statement after the lock's: its snapshot holds what the list's previous writer committed.
      SELECT * INTO stored FROM todos t WHERE t.id = todo AND t.household_id = household;
      IF NOT FOUND THEN RETURN 'missing'; END IF;
      IF jsonb_typeof(fields->'assigneeId') = 'string' AND NOT EXISTS (
        SELECT 1 FROM memberships m WHERE m.household_id = household AND m.user_id = (fields->>'assigneeId')::uuid
      ) THEN
        RETURN 'not a member';
      END IF;

      changed_row := stored;
      IF fields ? 'title' THEN changed_row.title := fields->>'title'; END IF;
      IF fields ? 'notes' THEN changed_row.notes := fields->>'notes'; END IF;
      IF fields ? 'dueOn' THEN changed_row.due_on := (fields->>'dueOn')::date; END IF;
      IF fields ? 'assigneeId' THEN changed_row.assignee_id := (fields->>'assigneeId')::uuid; END IF;
      IF new_done IS NOT NULL AND new_done IS DISTINCT FROM stored.done THEN
        changed_row.done := new_done;
        changed_row.done_at := CASE WHEN new_done THEN now() END;
      END IF;
      IF (changed_row.title, changed_row.notes, changed_row.due_on, changed_row.assignee_id, changed_row.done)
         IS DISTINCT FROM (stored.title, stored.notes, stored.due_on, stored.assignee_id, stored.done) THEN
        UPDATE todos t SET title = changed_row.title, notes = changed_row.notes, due_on = changed_row.due_on,
                           assignee_id = changed_row.assignee_id, done = changed_row.done, done_at = changed_row.done_at, updated_at = now()
         WHERE t.id = todo;
        moved := 1;
      END IF;

      IF new_position IS NOT NULL THEN
        SELECT array_agg(t.id ORDER BY t.position) INTO ids FROM todos t WHERE t.household_id = household;
        target := LEAST(new_position, cardinality(ids) - 1);
        IF target <> array_position(ids, todo) - 1 THEN
          ids := array_remove(ids, todo);
          ids := ids[1:target] || todo || ids[target + 1:];
          -- todos_dense waits for the end of the statement (deferred), so the rows may change in any order.
          UPDATE todos t SET position = v.ord - 1, updated_at = now()
            FROM unnest(ids) WITH ORDINALITY AS v(id, ord)
           WHERE t.id = v.id AND t.household_id = household AND t.position <> v.ord - 1;
          moved := 1;
        END IF;
      END IF;
      RETURN CASE WHEN moved = 1 THEN 'changed' ELSE 'unchanged' END;
    END $$`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('DROP FUNCTION todo_list_update(bigint, uuid, uuid, jsonb, boolean, integer)');
}
