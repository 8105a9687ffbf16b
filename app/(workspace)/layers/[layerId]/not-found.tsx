import Link from "next/link";

export default function LayerNotFound() {
  return (
    <div className="space-y-3">
      <h1 className="text-2xl font-bold">No such layer</h1>
      <p>It may have been deleted, or the address is mistyped.</p>
      <Link href="/layers" className="text-tide hover:underline">
        See all layers
      </Link>
    </div>
  );
}
