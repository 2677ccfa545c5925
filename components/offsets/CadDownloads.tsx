/**
 * Downloads for the drawing office: the plan as DXF (real-world coordinates in the bridge's unit) and
 * the alignment and profile as LandXML 1.2, both of the latest revision.
 */
export default function CadDownloads({ bridgeId, revision }: { bridgeId: number; revision: number }) {
  return (
    <section aria-labelledby="cad-downloads-title" className="no-print card flex flex-wrap items-center gap-x-4 gap-y-2 p-3 sm:p-4">
      <h2 id="cad-downloads-title" className="text-sm font-bold text-concrete-900">
        For CAD and other tools <span className="font-normal text-concrete-600">(revision {revision})</span>
      </h2>
      <a href={`/api/bridges/${bridgeId}/plan.dxf`} className="btn-secondary min-h-11" download>
        Plan (DXF)
      </a>
      <a href={`/api/bridges/${bridgeId}/alignment.xml`} className="btn-secondary min-h-11" download>
        Alignment and profile (LandXML 1.2)
      </a>
      <p className="basis-full text-xs text-concrete-600">
        The DXF holds the alignment with station ticks, deck edges, gutter lines, girders, bent lines and every exterior girder point with its edge point, on layers ALIGNMENT, DECK-EDGE, GUTTER,
        GIRDER, BENT, GIRDER-POINT and TEXT, in the bridge&apos;s own coordinates.
      </p>
    </section>
  );
}
