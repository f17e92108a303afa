/**
 * The piece's outline as the server drew it for the customer (our own renderer's SVG, labels
 * escaped, no hole sizes), scaled to the panel. Not a template: nothing here is to print.
 */
export function ProofDrawing({ svg, label }: { svg: string; label: string }) {
  return (
    <figure className="m-0">
      <div
        role="img"
        aria-label={label}
        data-testid="proof-drawing"
        className="drawing-screen overflow-hidden rounded-md border border-hide-200 bg-white p-3 [&>svg]:h-auto [&>svg]:w-full"
        dangerouslySetInnerHTML={{ __html: svg }}
      />
      <figcaption className="mt-1.5 text-xs text-hide-600">Drawn to scale, shown smaller than life. The lengths in the details are the ones to check.</figcaption>
    </figure>
  );
}
