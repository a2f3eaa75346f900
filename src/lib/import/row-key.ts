/**
 * The key two records share when they are the same test: borehole, sample id and depths (ids compared
 * without regard to case or spacing, depths in metres to the millimetre). The server builds the set of
 * keys of the firm's earlier uploads with this same function.
 */
export function duplicateKey(row: {
  boreholeId: string;
  sampleId?: string | null;
  depthTop: number;
  depthBottom: number;
}): string {
  return [idPart(row.boreholeId), idPart(row.sampleId ?? ''), row.depthTop.toFixed(3), row.depthBottom.toFixed(3)].join('|');
}

function idPart(text: string): string {
  return text.trim().toLowerCase().replace(/\s+/g, ' ');
}
