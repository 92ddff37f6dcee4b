// /api/auth/* — sign-up, sign-in, verification, reset, sessions (better-auth)
import { toNextJsHandler } from "better-auth/next-js";
import { getAuth } from "@/lib/auth";
import { adjustAuthResponse } from "@/lib/auth/auth-response";

export const dynamic = "force-dynamic";

const handler = async (request: Request) => adjustAuthResponse(request, await getAuth().handler(request));
export const { GET, POST } = toNextJsHandler(handler);
