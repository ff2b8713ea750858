import { UniqueConstraintError } from 'sequelize';
import type { ProductCreate, ProductPatch } from '../../../shared/schemas/products';
import { Product } from '../../db/models';
import { AppError, notFound } from '../../http/errors';
import { placeOfHousehold } from './places';
import { productView } from './views';

function sameName(error: unknown, name: string | undefined): never {
  if (error instanceof UniqueConstraintError) {
    throw new AppError(
      409,
      'conflict',
      `The household already has a product called “${name}”. Choose another name or edit that one.`,
      { name: 'That name is taken.' },
    );
  }
  throw error;
}

export async function listProducts(householdId: string) {
  const products = await Product.findAll({ where: { householdId }, order: [['name', 'ASC']] });
  return products.map(productView);
}

export async function findProduct(householdId: string, productId: string) {
  const product = await Product.findOne({ where: { householdId, id: productId } });
  if (!product) throw notFound('That product');
  return product;
}

export async function createProduct(householdId: string, input: ProductCreate) {
  if (input.defaultPlaceId !== undefined) await placeOfHousehold(householdId, input.defaultPlaceId, 'defaultPlaceId');
  const product = await Product.create({ householdId, ...input }).catch((error) => sameName(error, input.name));
  return productView(product);
}

export async function updateProduct(householdId: string, productId: string, patch: ProductPatch) {
  const product = await findProduct(householdId, productId);
  if (patch.defaultPlaceId !== undefined) await placeOfHousehold(householdId, patch.defaultPlaceId, 'defaultPlaceId');
  await product.update(patch).catch((error) => sameName(error, patch.name));
  return productView(product);
}
