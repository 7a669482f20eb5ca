/** Databases made for `npm run test:pg` start with this; pg-teardown.ts drops them after the run. */
export const PG_TEST_PREFIX = 'fizzwright_test_';
