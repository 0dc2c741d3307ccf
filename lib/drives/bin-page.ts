/** A drop point's own page (where its sign's QR code leads): how full the bin is, one tap to say so. */
export function binPagePath(slug: string, pointId: string): string {
  return `/drives/${slug}/bins/${pointId}`;
}
