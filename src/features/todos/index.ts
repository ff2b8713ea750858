// What other features may use of the to-do list.
export { refreshPlanning } from './api/refresh-planning';
export { todoTickDefaults, useTickTodo, useUpdateTodo } from './api/update-todo';
