// @ts-nocheck
import { NotFoundNotice } from "@/components/ui/not-found-notice";

export default function RecommendationNotFound() {
  return <NotFoundNotice title="No such recommendation" why="It may have been removed along with its combination." href="/recommendations" back="All recommendations" />;
}
