// Work the server should do soon after start-up but not before its first answer (loading modules
// that answer no signed-out page): run once the first response's body has been sent.

let armed = false;

/** The response as is; the first one this process sends runs `then` once its body has gone out. */
export function afterFirstAnswer(response: Response, then: () => void): Response {
  if (armed) return response;
  armed = true;
  const later = () => void setImmediate(then);
  if (!response.body) {
    later();
    return response;
  }
  const done = new TransformStream<Uint8Array, Uint8Array>({ flush: later });
  return new Response(response.body.pipeThrough(done), response);
}
