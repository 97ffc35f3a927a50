// One shape for API failures: { error: code, message, ...details }, with the matching status.
export function jsonError(status: number, error: string, message: string, details: Record<string, unknown> = {}): Response {
  return Response.json({ error, message, ...details }, { status, headers: { "Cache-Control": "no-store" } });
}

/** Every API answer carries the same standing caution as the pages and sheets. */
export const API_CAUTION =
  "Reference designs, not approvals: check against the code adopted where you build, the manufacturers' instructions, and a licensed design professional where one is required.";
