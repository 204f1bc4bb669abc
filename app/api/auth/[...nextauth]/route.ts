import NextAuth from "next-auth";
import { authOptions } from "@/app/_lib/auth-options";

type Ctx = { params: Promise<{ nextauth: string[] }> };

async function handler(req: Request, ctx: Ctx) {
  return NextAuth(authOptions())(req, ctx);
}

export { handler as GET, handler as POST };
