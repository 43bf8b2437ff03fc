import { identifyCaution } from '../utils/identify-caution';

/** PRODUCT.md's caution beside results: always shown, never dismissable, printed with the report. */
export function CautionNote({ text = identifyCaution }: { text?: string | undefined }) {
  return (
    <aside aria-label="Caution" className="rounded-md border-l-4 border-copper bg-copper-soft px-4 py-3 text-sm leading-relaxed text-ink">
      <span className="font-bold">Caution. </span>
      {text}
    </aside>
  );
}
