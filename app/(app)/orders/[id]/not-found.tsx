import Link from "next/link";

export default function OrderNotFound() {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="text-2xl font-semibold">No such order</h1>
      <p className="text-muted">It may have been removed along with its sheet.</p>
      <Link href="/orders" className="underline">
        All orders
      </Link>
    </div>
  );
}
