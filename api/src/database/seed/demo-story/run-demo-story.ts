import { runDemoStory } from './demo-story';

/**
 * `npm run seed:story -w api`: plays the demo story against the running API once per database (scripts/stack.sh
 * start runs it after the server answers). Reads PORT and MAIL_FAKE_URL from the environment of .local/dev/env.sh.
 * The test and production profiles are refused: the suites and journeys rely on the minimal seed.
 */
async function main(): Promise<void> {
  const { NODE_ENV, PORT, MAIL_FAKE_URL } = process.env;
  if (NODE_ENV !== 'development') {
    console.log(`Demo story skipped: it runs only on the development database (NODE_ENV is ${NODE_ENV ?? 'unset'}).`);
    return;
  }
  if (!PORT || !MAIL_FAKE_URL) throw new Error('PORT and MAIL_FAKE_URL must be set (source .local/dev/env.sh)');
  const result = await runDemoStory({ baseUrl: `http://127.0.0.1:${PORT}`, mailFakeUrl: MAIL_FAKE_URL });
  const seconds = (result.ms / 1000).toFixed(1);
  if (result.made.length === 0) {
    console.log(`Demo story already present (${result.alreadyPresent} jobs); nothing changed.`);
    return;
  }
  const stages = result.made.map((job) => (process.env.DEMO_STORY_TRACE ? `${job.stage} ${job.ms} ms` : job.stage)).join(', ');
  console.log(`Demo story: ${result.made.length} jobs added in ${seconds} s, one at each stage (${stages}).`);
}

main().catch((error: unknown) => {
  console.error('Demo story failed:', error instanceof Error ? error.message : error);
  process.exit(1);
});
