import { Router } from 'express';
import { z } from 'zod';
import { productCreate, productPatch } from '../../shared/schemas/products';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { body, params } from '../http/validate';
import { createProduct, findProduct, listProducts, updateProduct } from '../services/shelf/products';
import { productView } from '../services/shelf/views';

const productParams = z.object({ hid: z.string(), productId: z.uuid({ error: 'That product was not found.' }) });

export function productsRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });

  // Kept until the household's data version moves (products are among its versioned tables): every screen reads it.
  router.get('/products', householdAccess('read'), async (req, res) => {
    const { householdId } = currentMembership(req);
    await ctx.readCache.send(req, res, 'products', async () => ({ products: await listProducts(householdId) }), {
      plan: false,
    });
  });

  router.get('/products/:productId', householdAccess('read'), async (req, res) => {
    const { productId } = params(req, productParams);
    res.json({ product: productView(await findProduct(currentMembership(req).householdId, productId)) });
  });

  router.post('/products', householdAccess('cook'), async (req, res) => {
    res
      .status(201)
      .json({ product: await createProduct(currentMembership(req).householdId, body(req, productCreate)) });
  });

  router.patch('/products/:productId', householdAccess('cook'), async (req, res) => {
    const { productId } = params(req, productParams);
    res.json({ product: await updateProduct(currentMembership(req).householdId, productId, body(req, productPatch)) });
  });

  return router;
}
