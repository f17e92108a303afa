/**
 * The engine's SVG, scaled to the panel. The markup comes from our own renderer, which
 * escapes every label, so it is safe to place as HTML.
 */
export function DrawingView({ svg, label }: { svg: string; label: string }) {
  return (
    <figure className="m-0">
      <div
        role="img"
        aria-label={label}
        data-testid="drawing-preview"
        className="overflow-x-auto rounded-md border border-hide-200 bg-white p-3 [&>svg]:h-auto [&>svg]:w-full [&>svg]:min-w-[640px]"
        dangerouslySetInnerHTML={{ __html: svg }}
      />
      <figcaption className="mt-1.5 text-xs text-hide-600">
        Scaled to fit the screen. The printed template is full size: check its calibration square with a rule.
      </figcaption>
    </figure>
  );
}
