import { describe, expect, it } from 'vitest';
import { addDays } from '../../shared/domain';
import { dateWords, USE_BY_CAUTION_SENTENCE } from '../../shared/words';
import { Household, Pairing, PlanEntry } from '../../server/db/models';
import { todayIn } from '../../server/services/clock';
import { sweepDigests } from '../../server/services/digest';
import type { bareApp } from '../support/bare-app';
import { instantAt } from '../support/household-time';
import { newHousehold, openedJar } from '../support/opened-jar';
import type { StandIns } from '../support/stand-ins';
import { withStandInsApp } from '../support/stand-ins-app';

let built: ReturnType<typeof bareApp>;
let standIns: StandIns;
withStandInsApp((app, started) => {
  built = app;
  standIns = started;
});

describe('the weekly digest', () => {
  it("e-mails the week's plan, the jars to open and what expires, once, on the first day of the week at the reminder hour", async () => {
    const zone = 'Asia/Tokyo';
    const home = await newHousehold(built.app, zone);
    const today = todayIn(zone);
    const weekday = new Date(`${today}T00:00:00Z`).getUTCDay();
    await Household.update({ weekStartsOn: weekday }, { where: { id: home.householdId } });
    const { product } = await openedJar(home.householdId, {
      productName: 'Blackcurrant Jam',
      openedOn: addDays(today, -18),
      useWithinDays: 21,
      remainingTbsp: 2,
    });
    const entry = await PlanEntry.create({
      householdId: home.householdId,
      date: addDays(today, 1),
      slot: 'breakfast',
      position: 0,
      title: 'Oat scones',
      servings: 4,
    });
    await Pairing.create({
      householdId: home.householdId,
      planEntryId: entry.id,
      productId: product.id,
      tbspPerServing: 1,
    });

    await sweepDigests(built.ctx, instantAt(today, 7, 50, zone));
    expect(standIns.mail.to(home.email)).toHaveLength(0);
    await sweepDigests(built.ctx, instantAt(today, 8, 5, zone));
    await sweepDigests(built.ctx, instantAt(today, 9, 5, zone));
    const mails = standIns.mail.to(home.email);
    expect(mails).toHaveLength(1);
    // The app's date words ("Tue, Jun 9"), never an ISO date or a raw slot id such as "breakfast:".
    const day = (date: string) => dateWords(date, Number(today.slice(0, 4)));
    expect(mails[0].subject).toBe(`Fenwick Cellar: the week of ${day(today)}`);
    expect(mails[0].text).toContain(`${day(addDays(today, 1))} at breakfast: Oat scones with Blackcurrant Jam`);
    expect(mails[0].text).toContain('Use by this week');
    expect(mails[0].text).toContain(`- ${day(addDays(today, 3))}: Blackcurrant Jam (jar `);
    expect(mails[0].text).not.toMatch(/\d{4}-\d{2}-\d{2}/);
    // The use-by is a default: the e-mail says so beside the dates (NCHFP, "Storing Home Canned Foods", gives no single figure).
    expect(mails[0].text).toContain(USE_BY_CAUTION_SENTENCE);
    // 4 tbsp planned, 2 in the opened jar and no sealed jar: the shelf is short, nothing new to open.
    expect(mails[0].text).toContain('No new jars need opening.');
    expect(mails[0].html).toContain('Oat scones');
  });

  it('sends nothing on other days of the week', async () => {
    const zone = 'UTC';
    const home = await newHousehold(built.app, zone);
    const today = todayIn(zone);
    await Household.update(
      { weekStartsOn: (new Date(`${today}T00:00:00Z`).getUTCDay() + 1) % 7 },
      { where: { id: home.householdId } },
    );
    await sweepDigests(built.ctx, instantAt(today, 12, 0, zone));
    expect(standIns.mail.to(home.email)).toHaveLength(0);
  });
});
