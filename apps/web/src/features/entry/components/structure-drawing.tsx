import { describeError } from '../../../lib/describe-error';
import { useStructureDrawing } from '../api/get-structure-drawing';

type StructureDrawingProps = {
  structure: string;
  format: 'smiles' | 'molfile';
  /** The drawing endpoint is for contributors; others see the structure as text. */
  canDraw: boolean;
};

/** The stored structure drawn as an image (an SVG data URL, never markup in the page). */
export function StructureDrawing({ structure, format, canDraw }: StructureDrawingProps) {
  const drawing = useStructureDrawing(structure, format, canDraw);
  const asText =
    format === 'smiles' ? (
      <p className="break-all font-mono text-sm">SMILES {structure}</p>
    ) : (
      <p className="text-sm text-ink-soft">Structure stored as a molfile.</p>
    );
  if (!canDraw) return asText;
  if (drawing.isPending) return <p className="text-sm text-ink-soft">Drawing the structure…</p>;
  if (drawing.isError) {
    return (
      <div>
        {asText}
        <p className="text-sm text-copper">The drawing failed: {describeError(drawing.error)}</p>
      </div>
    );
  }
  return (
    <figure className="m-0">
      <img
        src={`data:image/svg+xml;charset=utf-8,${encodeURIComponent(drawing.data.svg)}`}
        alt={`Structure drawing, ${drawing.data.formula}`}
        className="max-h-56 w-full rounded-md border border-rule-faint bg-paper object-contain"
      />
      {format === 'smiles' ? <figcaption className="mt-1 break-all font-mono text-xs text-ink-soft">{structure}</figcaption> : null}
    </figure>
  );
}
