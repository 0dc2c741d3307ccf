import { geoUri, osmUrl } from "@/lib/map/directions";
import { binPagePath } from "@/lib/drives/bin-page";

const LINK = "inline-flex min-h-11 items-center rounded-lg border-2 border-ink/30 bg-white px-3 py-1 font-semibold no-underline hover:border-ink";

/**
 * Rendered by the server and handed to the live list, so these links cost the
 * page no JavaScript: directions in the visitor's own map app (a geo: URI, and
 * the point on openstreetmap.org), this point's own page, and a pledge form
 * that opens on this point (a plain link: it works with JavaScript off).
 */
export function PointLinks({ slug, point, onBinPage = false }: { slug: string; point: { id: string; name: string; lat: number; lng: number }; onBinPage?: boolean }) {
  return (
    <nav aria-label={`Links for ${point.name}`} className="mt-2 flex flex-wrap gap-2 text-sm">
      <a className={LINK} href={geoUri(point.lat, point.lng)}>
        Directions (map app)
      </a>
      <a className={LINK} href={osmUrl(point.lat, point.lng)} rel="noopener noreferrer" target="_blank">
        Open in OpenStreetMap
      </a>
      <a className={LINK} href={`/drives/${slug}?point=${point.id}#pledge`}>
        Pledge cans here
      </a>
      {onBinPage ? null : (
        <a className={LINK} href={binPagePath(slug, point.id)}>
          This bin’s page
        </a>
      )}
    </nav>
  );
}
