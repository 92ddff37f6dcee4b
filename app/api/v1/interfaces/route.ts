// GET /api/v1/interfaces — the connection standards parts can carry
import { INTERFACES } from "@/lib/interfaces";

export function GET() {
  return Response.json({ items: INTERFACES });
}
