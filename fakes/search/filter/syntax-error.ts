// A filter that does not parse, worded as the engine words it: the problem, then
// "<start column>:<end column> <the whole expression>".

function escapeDebug(text: string): string {
  return text.replace(
    /[\\'"\n\r\t]/g,
    (c) => ({ '\\': '\\\\', "'": "\\'", '"': '\\"', '\n': '\\n', '\r': '\\r', '\t': '\\t' })[c] ?? c,
  );
}

export class FilterSyntaxError extends Error {
  /** A soft failure lets the parser try another reading; a hard one ends parsing. */
  constructor(
    readonly problem: string,
    readonly start: number,
    readonly fragment: string,
    readonly source: string,
    readonly hard: boolean,
  ) {
    super(problem);
  }

  hardened(): FilterSyntaxError {
    return this.hard ? this : new FilterSyntaxError(this.problem, this.start, this.fragment, this.source, true);
  }

  render(): string {
    const column = Array.from(this.source.slice(0, this.start)).length + 1;
    const end = column + Array.from(this.fragment).length;
    return `${this.problem}\n${column}:${end} ${this.source}`;
  }
}

export const problems = {
  expectedValue: (fragment: string) =>
    fragment.trim() === ''
      ? 'Was expecting a value but instead got nothing.'
      : `Was expecting a value but instead got \`${escapeDebug(fragment)}\`.`,
  reservedValue: (fragment: string) =>
    `Was expecting a value but instead got \`${escapeDebug(fragment)}\`, which is a reserved keyword. To use \`${escapeDebug(fragment)}\` as a field name or a value, surround it by quotes.`,
  malformedValue: (fragment: string) => `Malformed value: \`${escapeDebug(fragment)}\`.`,
  missingClosing: (fragment: string, c: string) =>
    `Expression \`${escapeDebug(fragment)}\` is missing the following closing delimiter: \`${c}\`.`,
  invalidPrimary: (fragment: string) =>
    `Was expecting an operation \`=\`, \`!=\`, \`>=\`, \`>\`, \`<=\`, \`<\`, \`IN\`, \`NOT IN\`, \`TO\`, \`EXISTS\`, \`NOT EXISTS\`, \`IS NULL\`, \`IS NOT NULL\`, \`IS EMPTY\`, \`IS NOT EMPTY\`, \`CONTAINS\`, \`NOT CONTAINS\`, \`STARTS WITH\`, \`NOT STARTS WITH\`, \`_geoRadius\`, \`_geoBoundingBox\` or \`_geoPolygon\` ${
      fragment.trim() === '' ? 'but instead got nothing.' : `at \`${escapeDebug(fragment)}\`.`
    }`,
  expectedEof: (fragment: string) =>
    `Found unexpected characters at the end of the filter: \`${escapeDebug(fragment)}\`. You probably forgot an \`OR\` or an \`AND\` rule.`,
  inOpening: () => 'Expected `[` after `IN` keyword.',
  inClosing: () => 'Expected matching `]` after the list of field names given to `IN[`',
  inExpectedValue: (fragment: string, reserved: boolean) =>
    reserved
      ? `Expected only comma-separated field names inside \`IN[..]\` but instead found \`${escapeDebug(fragment)}\`, which is a keyword. To use \`${escapeDebug(fragment)}\` as a field name or a value, surround it by quotes.`
      : `Expected only comma-separated field names inside \`IN[..]\` but instead found \`${escapeDebug(fragment)}\`.`,
  depth: () =>
    'The filter exceeded the maximum depth limit. Try rewriting the filter so that it contains fewer nested conditions.',
  contains: () =>
    'Using `CONTAINS` in a filter requires enabling the `contains filter` experimental feature. See https://github.com/orgs/meilisearch/discussions/763',
  unsupported: (what: string) => `The local search fake does not support \`${what}\` filters.`,
  reservedGeo: (name: string) =>
    `\`${name}\` is a reserved keyword and thus can't be used as a filter expression. Use the \`_geoRadius(latitude, longitude, distance)\` or \`_geoBoundingBox([latitude, longitude], [latitude, longitude])\` built-in rules to filter on \`_geo\` coordinates.`,
};
