// What other features may use of the signed-in person.
export { useMe } from './api/get-me';
