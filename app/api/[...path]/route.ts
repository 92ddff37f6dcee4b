// /api/* that names no route: a JSON 404 like every other API error, not the HTML page.
import { AppError, toErrorResponse } from "@/lib/errors";

export const dynamic = "force-dynamic";

const notFound = () => toErrorResponse(new AppError("not_found:route", "No API route at this address."));
export const GET = notFound;
export const POST = notFound;
export const PUT = notFound;
export const PATCH = notFound;
export const DELETE = notFound;
