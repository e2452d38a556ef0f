// The errors services throw for the API to answer with a status instead of a 500. It lives in lib
// because lib/server/api.ts turns it into a response, and lib never imports services (DEVELOPERS.md "Layers").

/** A refusal with an HTTP meaning: 403 the role may not (a route's narrower case), 404 not in this shop, 409 conflict, 422 not allowed as asked,
 * 502 the payment service refused, 503 the payment service could not be reached. */
export class ServiceError extends Error {
  constructor(
    public status: 403 | 404 | 409 | 422 | 502 | 503,
    message: string,
    /** the refused fields, by the form's paths (e.g. legs.left.backPin), each with its message */
    public issues?: Record<string, string>,
  ) {
    super(message);
  }
}
