// What other features may use of restock: putting a product's batch on the to-do list.
export { useAddRestockTodo } from './api/add-restock-todo';
