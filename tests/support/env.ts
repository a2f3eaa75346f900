/** Reads a variable that scripts/test.mjs sets for the suites that need the running stack. */
export function testEnv(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set: run this suite through \`npm test\` (scripts/test.mjs sets it).`);
  return value;
}
