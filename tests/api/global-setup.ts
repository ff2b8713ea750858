export default function checkEnvironment() {
  if (!process.env.LARDERLY_TEST_ADMIN_URL || !process.env.LARDERLY_TEST_TEMPLATE) {
    throw new Error('The API tests need PostgreSQL: run them with `npm test` (or `npm test -- --project api`).');
  }
}
