/**
 * Databases made for one `npm run test:pg` start with this: the run's number (TEST_PG_RUN, the shell's process id)
 * is in it, so pg-teardown.ts drops this run's databases and never those of another run going on at the same time.
 */
export const pgTestPrefix = (run = process.env.TEST_PG_RUN ?? 'run') => `fizzwright_test_${run.replace(/\W/g, '')}_`;
