/** Placeholder: the compare screen is being built (owned by the revisions/review/admin work). */
export default function CompareRoute() {
  return <p className="p-6 text-concrete-600">This screen is not built yet.</p>;
}
