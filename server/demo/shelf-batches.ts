// Our invented demo shelf: two seasons of batches and what became of each jar, in days before today.
import type { JarSize, Mouth } from '../../shared/domain';
import type { ProductCreate } from '../../shared/schemas/products';

export const CALLOWAY_PRODUCTS: ProductCreate[] = [
  {
    name: 'Green Tomato Chutney',
    kind: 'chutney',
    heat: 1,
    favourite: true,
    minJars: 4,
    jarSize: 'half-pint',
    harvestMonths: [9, 10],
    colour: 'leaf',
    notes: 'The last green tomatoes before frost. Good with sharp cheddar.',
  },
  {
    name: 'Spiced Pear Butter',
    kind: 'fruit-butter',
    heat: 0,
    favourite: true,
    minJars: 4,
    jarSize: 'half-pint',
    harvestMonths: [9, 10],
    colour: 'honey',
    notes: 'Pears from the old tree by the gate.',
  },
  {
    name: 'Dilly Carrots',
    kind: 'pickle',
    heat: 1,
    minJars: 2,
    jarSize: 'pint',
    harvestMonths: [7, 8, 9],
    colour: 'wheat',
  },
  {
    name: 'Smoky Tomato Jam',
    kind: 'jam',
    heat: 2,
    favourite: true,
    minJars: 4,
    jarSize: 'half-pint',
    harvestMonths: [8, 9],
    colour: 'earth',
    notes: 'On burgers and with eggs.',
  },
  {
    name: 'Sweet Corn Relish',
    kind: 'relish',
    heat: 1,
    favourite: true,
    minJars: 4,
    jarSize: 'half-pint',
    harvestMonths: [7, 8],
    colour: 'honey',
  },
  {
    name: 'Pickled Beets',
    kind: 'pickle',
    heat: 0,
    minJars: 2,
    jarSize: 'pint',
    harvestMonths: [6, 7, 10],
    colour: 'earth',
  },
  {
    name: 'Bread-and-Butter Zucchini Pickles',
    kind: 'pickle',
    heat: 0,
    minJars: 2,
    jarSize: 'pint',
    harvestMonths: [7, 8],
    colour: 'leaf',
  },
  {
    name: 'Hot Pepper Jelly',
    kind: 'jelly',
    heat: 4,
    minJars: 1,
    jarSize: 'half-pint',
    harvestMonths: [8, 9],
    colour: 'brine',
    notes: 'Tobias’s; a spoonful over cream cheese.',
  },
  {
    name: 'Rhubarb-Ginger Jam',
    kind: 'jam',
    heat: 0,
    minJars: 2,
    jarSize: 'half-pint',
    harvestMonths: [5, 6],
    colour: 'wheat',
  },
  {
    name: 'Roasted Salsa Verde',
    kind: 'salsa',
    heat: 3,
    minJars: 2,
    jarSize: 'pint',
    harvestMonths: [8, 9],
    colour: 'leaf',
  },
  {
    name: 'Plum Ketchup',
    kind: 'sauce',
    heat: 1,
    minJars: 1,
    jarSize: 'half-pint',
    harvestMonths: [8, 9],
    colour: 'earth',
  },
  {
    name: 'Apple-Cranberry Sauce',
    kind: 'sauce',
    heat: 0,
    minJars: 2,
    jarSize: 'pint',
    harvestMonths: [10, 11],
    colour: 'honey',
  },
];

export const MARSH_END_PRODUCTS: ProductCreate[] = [
  {
    name: 'Marsh End Bread Pickles',
    kind: 'pickle',
    heat: 0,
    favourite: true,
    minJars: 3,
    jarSize: 'pint',
    harvestMonths: [7, 8],
    colour: 'leaf',
  },
  {
    name: 'Crabapple Jelly',
    kind: 'jelly',
    heat: 0,
    minJars: 2,
    jarSize: 'half-pint',
    harvestMonths: [9, 10],
    colour: 'wheat',
  },
];

/** What became of the sealed jars, each number being days before today; the rest stay sealed. */
export interface JarFates {
  finished?: number[];
  /** opened and still in the fridge */
  opened?: number[];
  discarded?: number[];
  /** given away, and to whom when the giver said */
  given?: { daysAgo: number; to?: string }[];
}

export interface DemoBatch {
  product: string;
  daysAgo: number;
  jarSize: JarSize;
  /** The jars' mouth, where not the size's usual one: the relish goes in wide-mouth half-pints. */
  mouth?: Mouth;
  filled: number;
  sealed: number;
  notes?: string;
  fates: JarFates;
  /** what became of each unsealed jar: finished or discarded that many days ago; absent means still in the fridge */
  unsealedFates?: { finished?: number; discarded?: number }[];
}

// Favourites finish a jar every two to four weeks, so the 84-day restock history has something to read.
export const CALLOWAY_BATCHES: DemoBatch[] = [
  // Last year's season: mostly eaten; a few jars left past their year of best quality.
  {
    product: 'Sweet Corn Relish',
    daysAgo: 490,
    jarSize: 'half-pint',
    mouth: 'wide',
    filled: 9,
    sealed: 9,
    fates: { finished: [380, 340, 300, 270, 240, 200, 170, 150] },
  },
  {
    product: 'Dilly Carrots',
    daysAgo: 480,
    jarSize: 'pint',
    filled: 4,
    sealed: 4,
    fates: { finished: [400, 330, 260, 190] },
  },
  {
    product: 'Smoky Tomato Jam',
    daysAgo: 470,
    jarSize: 'half-pint',
    filled: 6,
    sealed: 6,
    fates: { finished: [420, 360, 310, 250, 210] },
  },
  {
    product: 'Plum Ketchup',
    daysAgo: 465,
    jarSize: 'half-pint',
    filled: 5,
    sealed: 5,
    fates: { finished: [400, 330, 280, 220] },
  },
  {
    product: 'Hot Pepper Jelly',
    daysAgo: 460,
    jarSize: 'half-pint',
    filled: 6,
    sealed: 6,
    fates: { finished: [390, 300, 230, 160, 100, 40] },
  },
  {
    product: 'Spiced Pear Butter',
    daysAgo: 440,
    jarSize: 'half-pint',
    filled: 7,
    sealed: 7,
    fates: { finished: [390, 350, 310, 280, 230, 190, 150] },
  },
  {
    product: 'Green Tomato Chutney',
    daysAgo: 430,
    jarSize: 'half-pint',
    filled: 8,
    sealed: 8,
    fates: { finished: [380, 340, 300, 260, 220, 180, 140] },
  },
  {
    product: 'Pickled Beets',
    daysAgo: 420,
    jarSize: 'pint',
    filled: 8,
    sealed: 8,
    fates: { finished: [370, 320, 260, 200, 150, 95] },
  },
  // This year's season.
  {
    product: 'Rhubarb-Ginger Jam',
    daysAgo: 180,
    jarSize: 'half-pint',
    filled: 6,
    sealed: 6,
    fates: { finished: [120, 70, 30] },
  },
  {
    product: 'Bread-and-Butter Zucchini Pickles',
    daysAgo: 130,
    jarSize: 'pint',
    filled: 8,
    sealed: 7,
    notes: 'One lid did not seal; it went in the fridge.',
    fates: { finished: [90, 50, 12] },
    unsealedFates: [{ finished: 124 }],
  },
  {
    product: 'Sweet Corn Relish',
    daysAgo: 120,
    jarSize: 'half-pint',
    mouth: 'wide',
    filled: 9,
    sealed: 9,
    fates: { finished: [80, 62, 44, 27], opened: [12] },
  },
  {
    product: 'Dilly Carrots',
    daysAgo: 110,
    jarSize: 'pint',
    filled: 4,
    sealed: 4,
    fates: { finished: [60], opened: [25] },
  },
  {
    product: 'Smoky Tomato Jam',
    daysAgo: 100,
    jarSize: 'half-pint',
    filled: 7,
    sealed: 7,
    fates: { finished: [78, 58, 37], opened: [16] },
  },
  {
    product: 'Roasted Salsa Verde',
    daysAgo: 95,
    jarSize: 'pint',
    filled: 5,
    sealed: 5,
    fates: { finished: [70, 33], given: [{ daysAgo: 6 }] },
  },
  {
    product: 'Hot Pepper Jelly',
    daysAgo: 90,
    jarSize: 'half-pint',
    filled: 6,
    sealed: 5,
    notes: 'Set softer than usual. One jar did not seal.',
    fates: {
      given: [
        { daysAgo: 9, to: 'the Okafors next door' },
        { daysAgo: 2, to: 'Wren, for the cheese board' },
      ],
    },
    unsealedFates: [{ discarded: 80 }],
  },
  {
    product: 'Plum Ketchup',
    daysAgo: 75,
    jarSize: 'half-pint',
    filled: 5,
    sealed: 5,
    fates: { finished: [40, 20], opened: [4] },
  },
  {
    product: 'Spiced Pear Butter',
    daysAgo: 65,
    jarSize: 'half-pint',
    filled: 7,
    sealed: 7,
    fates: { finished: [60, 45, 33], opened: [19] },
  },
  {
    product: 'Green Tomato Chutney',
    daysAgo: 60,
    jarSize: 'half-pint',
    filled: 8,
    sealed: 8,
    fates: { finished: [58, 40], opened: [27] },
  },
  { product: 'Pickled Beets', daysAgo: 55, jarSize: 'pint', filled: 8, sealed: 8, fates: { finished: [30] } },
  {
    product: 'Apple-Cranberry Sauce',
    daysAgo: 3,
    jarSize: 'pint',
    filled: 6,
    sealed: 5,
    notes: 'One jar did not seal: in the fridge, eat it this week.',
    fates: {},
  },
];

export const MARSH_END_BATCHES: DemoBatch[] = [
  {
    product: 'Marsh End Bread Pickles',
    daysAgo: 140,
    jarSize: 'pint',
    filled: 7,
    sealed: 7,
    fates: { finished: [100, 60], opened: [10] },
  },
  { product: 'Crabapple Jelly', daysAgo: 70, jarSize: 'half-pint', filled: 6, sealed: 6, fates: { finished: [20] } },
];
