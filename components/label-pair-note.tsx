// "130C/260C" explained where the pair is shown: the first is the labelled continuous rating, the second
// the burst rating (both as printed by the maker; Sagline measures neither claim directly).
export function LabelPairNote({ burst }: { burst: boolean }) {
  return burst ? <span className="muted text-xs">(continuous/burst, as labelled)</span> : null;
}
