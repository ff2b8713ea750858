import { describe, expect, it } from 'vitest';
import { placeHoldsJarsWords, placeMoveWords, placeWords } from '@shared/words/shelf-places';
import { shelfBatchRows } from '../../src/features/shelf/shelf-rows';
import type { JarView } from '@shared/schemas/batches';

describe('where a jar is, in words', () => {
  it('puts “in the” before a household’s place name, unless the name brings its own article', () => {
    expect(placeWords('Pantry shelf')).toBe('in the Pantry shelf');
    expect(placeWords(' Cellar shelf 2 ')).toBe('in the Cellar shelf 2');
    expect(placeWords('the cupboard under the porch steps')).toBe('in the cupboard under the porch steps');
    expect(placeWords('Our loft')).toBe('in Our loft');
    expect(placeWords('Theatre box')).toBe('in the Theatre box');
    expect(placeWords(null)).toBe('with no place named');
  });

  it('says what a move was, and why a place with jars cannot simply go', () => {
    expect(placeMoveWords({ from: 'Pantry shelf', to: null })).toBe('moved from Pantry shelf to no place');
    expect(placeHoldsJarsWords('Garage bench', 1)).toBe(
      'Garage bench still holds 1 jar. Choose where it goes (another place or no place), then remove it.',
    );
  });
});

describe('the shelf table’s place column', () => {
  const jar = (id: string, placeName: string | null): JarView =>
    ({
      id,
      code: id,
      state: 'sealed',
      batchId: 'b1',
      productId: 'p1',
      productName: 'Pickled Beets',
      productKind: 'pickle',
      productColour: 'earth',
      cannedOn: '2026-10-09',
      jarSize: 'pint',
      bestBy: '2027-10-09',
      pastBestQuality: false,
      batchNotes: '',
      placeId: placeName,
      placeName,
    }) as JarView;

  it('names each place a batch’s sealed jars are in, once', () => {
    const [row] = shelfBatchRows(
      [jar('a', 'Pantry shelf'), jar('b', null), jar('c', 'Cellar'), jar('d', 'Cellar')],
      [],
    );
    expect(row).toMatchObject({ sealed: 4, places: 'Pantry shelf, Cellar' });
  });
});
