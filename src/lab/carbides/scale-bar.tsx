/** A scale bar in µm over the bottom-left corner of a canvas; length picked to be a round number. */
export function ScaleBar({ pxPerUm }: { pxPerUm: number }) {
  const lengthUm = [1, 2, 5, 10, 20, 50].find((l) => l * pxPerUm >= 60) ?? 50;
  return (
    <div className="pointer-events-none absolute bottom-2 left-2 rounded-xs bg-soot-950/80 px-2 py-1 text-bone-50">
      <div className="h-1.5 border-x-2 border-b-2 border-bone-50" style={{ width: lengthUm * pxPerUm }} aria-hidden="true" />
      <p className="mt-0.5 font-mono text-[0.7rem] leading-none">{lengthUm} µm</p>
    </div>
  );
}
