// @ts-nocheck
import { NotFoundNotice } from "@/components/ui/not-found-notice";

export default function OrderNotFound() {
  return <NotFoundNotice title="No such order" why="It may have been removed along with its sheet." href="/orders" back="All orders" />;
}
