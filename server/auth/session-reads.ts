import type pg from 'pg';

/** One request's session read: its session id and the household in its path (null off household routes). */
export interface SessionAsk {
  sid: string;
  householdId: string | null;
}
type Answer<Row> = (error: Error | null, row?: Row) => void;

/**
 * Reads sessions for many requests in as few round trips as the load asks for: while fewer than `lanes` reads
 * are on their way, a request's read goes at once and alone; while all lanes are busy, the requests that arrive
 * wait for the next lane and go in it together, as one query over all their session ids. Nothing is kept
 * between reads: each request's read is sent after the request arrived, so a sign-out or a removed membership
 * written by any process before then counts (the same rule as one query per request), and a quiet server adds
 * no wait at all. At 32 connections this cut PostgreSQL's statements per request and pg's per-query work
 * (acquiring a client, building its parsers) to a fraction (see README, "Speed and scale").
 */
export function sessionReads<Row extends Record<string, unknown>>(
  pool: pg.Pool,
  statements: { one: { name: string; text: string }; many: { name: string; text: string } },
  lanes = 2,
) {
  let waiting: { ask: SessionAsk; answer: Answer<Row> }[] = [];
  let busy = 0;

  const send = () => {
    if (busy >= lanes || waiting.length === 0) return;
    const batch = waiting;
    waiting = [];
    busy += 1;
    const done = (error: Error | null, rows: Row[]) => {
      busy -= 1;
      send();
      if (batch.length === 1) return batch[0]!.answer(error, rows[0]);
      // The many-sessions query numbers its rows by the ask they answer (`slot`, from 1); a session that is
      // gone or expired has no row.
      const bySlot = new Map<number, Row>();
      for (const row of rows) bySlot.set(Number(row.slot), row);
      batch.forEach(({ answer }, index) => answer(error, error ? undefined : bySlot.get(index + 1)));
    };
    const [statement, values] =
      batch.length === 1
        ? [statements.one, [batch[0]!.ask.sid, batch[0]!.ask.householdId]]
        : [statements.many, [batch.map(({ ask }) => ask.sid), batch.map(({ ask }) => ask.householdId)]];
    pool.query<Row>({ ...statement, values }, (error, result) => done(error, error ? [] : result.rows));
  };

  return (ask: SessionAsk, answer: Answer<Row>) => {
    waiting.push({ ask, answer });
    send();
  };
}
