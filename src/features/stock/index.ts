// What other features may use of the jar and lid stock.
export { useStock } from './api/get-stock';
