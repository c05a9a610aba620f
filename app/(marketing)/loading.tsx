export default function Loading() {
  return (
    <div className="mx-auto max-w-6xl animate-pulse px-4 py-14 sm:px-6" aria-busy="true" aria-label="Loading">
      <div className="h-4 w-40 rounded bg-spruce-200" />
      <div className="mt-4 h-10 w-3/4 rounded bg-spruce-200" />
      <div className="mt-4 h-24 w-2/3 rounded bg-spruce-100" />
    </div>
  );
}
