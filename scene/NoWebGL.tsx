import Link from 'next/link';

/** What the page says instead of the 3D view when the browser has no WebGL. */
export default function NoWebGL({ offsetsHref }: { offsetsHref?: string }) {
  return (
    <div role="status" data-testid="no-webgl" className="flex min-h-48 flex-col items-start justify-center gap-2 rounded-lg border border-concrete-300 bg-concrete-100 p-6">
      <p className="font-semibold text-concrete-900">This browser cannot draw the 3D view (WebGL is turned off or not available).</p>
      <p className="text-concrete-700">
        The numbers do not depend on it: the edge widths per span are listed below
        {offsetsHref ? (
          <>
            , and every girder point is in the{' '}
            <Link href={offsetsHref} className="font-semibold text-brand-700 underline">
              offset table
            </Link>
          </>
        ) : null}
        .
      </p>
    </div>
  );
}
