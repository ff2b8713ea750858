import type { QueryInterface } from 'sequelize';
import { up as createFirstVersion } from './0210-todo-list-update';

/**
 * todo_list_update (migration 0210) answers first from one snapshot, without the list's lock: a change that would
 * change nothing (the to-do already where it is asked to go, its fields already so), a to-do that is not there and an
 * assignee who is not a member are answered at once, as of that snapshot. Only a change that writes takes the lock,
 * then reads the list again and works the change out anew, so it still builds on what the previous writer committed.
 * Before, every repeated move of one to-do queued on the lock with the moves that wrote, each holding a pooled
 * connection while it waited.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`
    CREATE OR REPLACE FUNCTION todo_list_update(list_lock bigint, household uuid, todo uuid, fields jsonb,
                                                new_done boolean, new_position integer) RETURNS text LANGUAGE plpgsql AS $$
    DECLARE
      snap record;
      stored todos;
      changed_row todos;
      ids uuid[];
      target integer;
      fields_change boolean;
      position_change boolean;
      locked boolean := false;
    BEGIN
      LOOP
        -- One statement, so the row, the list and the membership are read from one snapshot; after the lock, a
        -- snapshot that holds what the list's previous writer committed.
        SELECT t AS found_row,
               (SELECT array_agg(o.id ORDER BY o.position) FROM todos o WHERE o.household_id = household) AS list,
               (jsonb_typeof(fields->'assigneeId') IS DISTINCT FROM 'string' OR EXISTS (
                  SELECT 1 FROM memberships m WHERE m.household_id = household AND m.user_id = (fields->>'assigneeId')::uuid
               )) AS assignee_ok
          INTO snap FROM todos t WHERE t.id = todo AND t.household_id = household;
        IF NOT FOUND THEN RETURN 'missing'; END IF;
        IF NOT snap.assignee_ok THEN RETURN 'not a member'; END IF;
        stored := snap.found_row;
        ids := snap.list;

        changed_row := stored;
        IF fields ? 'title' THEN changed_row.title := fields->>'title'; END IF;
        IF fields ? 'notes' THEN changed_row.notes := fields->>'notes'; END IF;
        IF fields ? 'dueOn' THEN changed_row.due_on := (fields->>'dueOn')::date; END IF;
        IF fields ? 'assigneeId' THEN changed_row.assignee_id := (fields->>'assigneeId')::uuid; END IF;
        IF new_done IS NOT NULL AND new_done IS DISTINCT FROM stored.done THEN
          changed_row.done := new_done;
          changed_row.done_at := CASE WHEN new_done THEN now() END;
        END IF;
        fields_change := (changed_row.title, changed_row.notes, changed_row.due_on, changed_row.assignee_id, changed_row.done)
          IS DISTINCT FROM (stored.title, stored.notes, stored.due_on, stored.assignee_id, stored.done);
        target := LEAST(new_position, cardinality(ids) - 1);
        position_change := new_position IS NOT NULL AND target <> array_position(ids, todo) - 1;

        IF NOT fields_change AND NOT position_change THEN RETURN 'unchanged'; END IF;
        EXIT WHEN locked;
        PERFORM pg_advisory_xact_lock(list_lock);
        locked := true;
      END LOOP;

      IF fields_change THEN
        UPDATE todos t SET title = changed_row.title, notes = changed_row.notes, due_on = changed_row.due_on,
                           assignee_id = changed_row.assignee_id, done = changed_row.done, done_at = changed_row.done_at, updated_at = now()
         WHERE t.id = todo;
      END IF;
      IF position_change THEN
        ids := array_remove(ids, todo);
        ids := ids[1:target] || todo || ids[target + 1:];
        -- todos_dense waits for the end of the statement (deferred), so the rows may change in any order.
        UPDATE todos t SET position = v.ord - 1, updated_at = now()
          FROM unnest(ids) WITH ORDINALITY AS v(id, ord)
         WHERE t.id = v.id AND t.household_id = household AND t.position <> v.ord - 1;
      END IF;
      RETURN 'changed';
    END $$`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('DROP FUNCTION todo_list_update(bigint, uuid, uuid, jsonb, boolean, integer)');
  await createFirstVersion({ context: qi });
}
