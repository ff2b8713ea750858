import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Household } from '../../server/db/models';
import { buildDigest } from '../../server/services/digest';
import { digestMail } from '../../server/services/mail/digest-mail';
import { demoApp } from '../support/app';
import { addJars, addProduct } from '../support/restock-fixtures';

const TODAY = '2026-12-02';
let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

describe('restock in the weekly digest', () => {
  it('lists each restock suggestion with its reason under "Restock suggestions"', async () => {
    const product = await addProduct(ctx.householdId, { name: 'Test Digest Butter', favourite: true, minJars: 5 });
    await addJars(product, { sealed: 2 });
    const household = (await Household.findByPk(ctx.householdId))!;
    const digest = await buildDigest(household, TODAY, 'http://127.0.0.1');
    const line = digest.restock.find((r) => r.productName === 'Test Digest Butter');
    expect(line?.reason).toMatch(
      /^2 sealed jars left; you keep at least 5\. About \d+ half-pint jars would last until the next harvest\.$/,
    );
    const mail = digestMail('keeper@larderly.test', digest);
    expect(mail.text).toMatch(/Restock suggestions\n(- .*\n)*- Test Digest Butter: 2 sealed jars left/);
  });

  it("never lists another household's products", async () => {
    const neighbour = (await Household.findByPk(ctx.neighbourHouseholdId))!;
    const digest = await buildDigest(neighbour, TODAY, 'http://127.0.0.1');
    expect(digest.restock.some((r) => r.productName.startsWith('Test '))).toBe(false);
  });
});
