import PlanSketchSvg from '@/components/editor/PlanSketchSvg';
import { planSketchData } from '@/lib/editor/plan-sketch-data';
import type { BridgeDescription } from '@/lib/geometry';
import { offsetsForBridge } from '@/lib/services/offsets';

/**
 * The plan sketch of a stored bridge, laid out on the server and sent as plain SVG markup: deck,
 * bents and girders from the current revision's offset table (the girders are left out when the
 * geometry cannot be built; the sketch then says so).
 */
export default async function BridgePlan({ id, description }: { id: number; description: BridgeDescription }) {
  const table = await offsetsForBridge(String(id))
    .then((r) => r.table)
    .catch(() => null);
  const sketch = planSketchData(description, table);
  if (!sketch) {
    return <p className="rounded-md bg-concrete-100 p-4 text-sm text-concrete-700">The plan cannot be drawn: the bents of this revision do not lie on its alignment.</p>;
  }
  return (
    <>
      <PlanSketchSvg s={sketch} name={description.name} units={description.units} compact />
      {table ? null : <p className="mt-2 text-sm text-fail-600">The girders are not drawn: this revision&apos;s geometry cannot be built. Edit the geometry to see the problem.</p>}
    </>
  );
}
