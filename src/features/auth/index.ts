// What other features may use of the signed-in person.
export { authKeys, useMe } from './api/get-me';
