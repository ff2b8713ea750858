// Loaded before server/index.ts by the shutdown test: on SIGUSR2 a promise nobody awaits fails, as a
// forgotten `await` in a route or a job would.
process.on('SIGUSR2', () => {
  void Promise.reject(new Error('a promise nobody awaited failed'));
});
