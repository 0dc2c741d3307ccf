/**
 * The glazing sheet seen from the front, in SVG user units (the plan's unit):
 * the sheet, and both manifolds shaded — dashed outside the sheet when it
 * covers the chamber only, inside it when it covers them too. Shared by the
 * planner's preview and the build sheet's dimensioned drawing.
 */
export function SheetOutline({ x, y, width, height, manifold, full, stroke, dash }: { x: number; y: number; width: number; height: number; manifold: number; full: boolean; stroke: number; dash: number }) {
  const m = manifold;
  return (
    <>
      {!full && m > 0 ? (
        <>
          <rect x={x} y={y - m} width={width} height={m} fill="#e2d5bf" stroke="#6b6156" strokeDasharray={`${dash}`} strokeWidth={stroke} />
          <rect x={x} y={y + height} width={width} height={m} fill="#e2d5bf" stroke="#6b6156" strokeDasharray={`${dash}`} strokeWidth={stroke} />
        </>
      ) : null}
      <rect x={x} y={y} width={width} height={height} fill="#f3ebdd" stroke="#1f1b16" strokeWidth={stroke * 2} />
      {full ? (
        <>
          <rect x={x} y={y} width={width} height={m} fill="#e2d5bf" />
          <rect x={x} y={y + height - m} width={width} height={m} fill="#e2d5bf" />
        </>
      ) : null}
    </>
  );
}
