// What other features may use of the shelf.
export { shelfKeys } from './api/keys';
