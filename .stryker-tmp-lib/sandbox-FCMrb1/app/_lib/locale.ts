// @ts-nocheck
// The request's locale for dates (see lib/format/dates): the browser's Accept-Language.
import { headers } from "next/headers";
import { resolveLocale } from "@/lib/format/dates";

export async function requestLocale(): Promise<string> {
  return resolveLocale((await headers()).get("accept-language"));
}
