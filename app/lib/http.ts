/** Throws a Response with the status when the condition fails (keeps handlers flat). */
export function invariantResponse(
  condition: unknown,
  message: string,
  init: { status: number } = { status: 400 },
): asserts condition {
  if (!condition) {
    throw new Response(message, { status: init.status, statusText: message });
  }
}
