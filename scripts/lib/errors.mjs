/** An error whose message is written for the person at the terminal: what happened and what to do. */
export class RunbookError extends Error {
  constructor(message) {
    super(message);
    this.name = 'RunbookError';
  }
}

/** Runs an async main function; a RunbookError prints its message alone, anything else its stack. */
export async function runMain(main) {
  try {
    await main();
  } catch (error) {
    if (error instanceof RunbookError) {
      console.error(`\n✖ ${error.message}\n`);
    } else {
      console.error(error);
    }
    process.exitCode = 1;
    process.emit('claybank-cleanup');
  }
}
