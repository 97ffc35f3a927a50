// One shape for API failures: { error: code, message, ...details }, with the matching status.
export function jsonError(
  status: number,
  error: string,
  message: string,
  details: Record<string, unknown> = {},
): Response {
  return Response.json({ error, message, ...details }, { status, headers: { "Cache-Control": "no-store" } });
}
