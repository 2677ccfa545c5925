import Link from 'next/link';

/** What the portfolio says when a page is empty: nothing matches, or no bridge exists yet (per role). */
export default function PortfolioEmpty({ filtered, canCreate }: { filtered: boolean; canCreate: boolean }) {
  if (filtered) {
    return (
      <div className="card p-8 text-center">
        <h2 className="text-lg font-bold text-concrete-900">No bridge matches these filters</h2>
        <p className="mt-2 text-concrete-700">Search for part of a name, structure number or route, or clear the filters to see every bridge.</p>
        <Link href="/bridges" className="btn-secondary mt-4">
          Clear the filters
        </Link>
      </div>
    );
  }
  return (
    <div className="card p-8 text-center">
      <h2 className="text-lg font-bold text-concrete-900">No bridges yet</h2>
      {canCreate ? (
        <>
          <p className="mt-2 text-concrete-700">Create the first bridge: start from the starter bridge, read a LandXML file, or paste a description.</p>
          <Link href="/bridges/new" className="btn-primary mt-4">
            Create the first bridge
          </Link>
        </>
      ) : (
        <p className="mt-2 text-concrete-700">An engineer has to add a bridge before its offsets can be shown here. Ask the engineer on your project to create it.</p>
      )}
    </div>
  );
}
