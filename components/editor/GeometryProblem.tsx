/** An amber "look here" box for geometry the engine cannot build (API answer 422). */
export default function GeometryProblem({ message, title = 'The geometry cannot be built' }: { message: string; title?: string }) {
  return (
    <div role="alert" className="rounded-md border border-caution-500 bg-caution-100 p-4 text-sm">
      <h2 className="font-bold text-caution-700">{title}</h2>
      <p className="mt-1 text-concrete-900">{message}</p>
    </div>
  );
}
