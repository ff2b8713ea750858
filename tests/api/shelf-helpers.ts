import type { demoApp } from '../support/app';

type Ctx = Awaited<ReturnType<typeof demoApp>>;
type Agent = Awaited<ReturnType<Ctx['signedIn']>>;

/** Looks up demo rows by their names, the way a person would find them on screen. */
export async function shelfLookups(ctx: Ctx, agent: Agent) {
  const base = `/api/households/${ctx.householdId}`;
  const products = (await agent.get(`${base}/products`)).body.products as { id: string; name: string }[];
  const recipes = (await agent.get(`${base}/recipes`)).body.recipes as {
    id: string;
    name: string;
    productId: string;
  }[];
  return {
    base,
    product: (name: string) => products.find((p) => p.name === name)!,
    recipe: (name: string) => recipes.find((r) => r.name === name)!,
    async sealedJars(productName?: string) {
      const jars = (await agent.get(`${base}/jars?state=sealed`)).body.jars as {
        id: string;
        code: string;
        productName: string;
        batchId: string;
      }[];
      return productName ? jars.filter((j) => j.productName === productName) : jars;
    },
    async counts() {
      const batches = (await agent.get(`${base}/batches`)).body.batches.length as number;
      const jars = (await agent.get(`${base}/jars?state=all`)).body.jars.length as number;
      return { batches, jars };
    },
  };
}
