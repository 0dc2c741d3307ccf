// The route map's box when a page gives none: the same for the map and its placeholder.
export const ROUTE_MAP_BOX = "h-72 w-full rounded-card border border-paper-edge sm:h-96";
