// The errors services throw for the API to answer with a status instead of a 500.

/** A refusal with an HTTP meaning: 404 not in this shop, 409 conflict, 422 not allowed as asked. */
export class ServiceError extends Error {
  constructor(
    public status: 404 | 409 | 422,
    message: string,
  ) {
    super(message);
  }
}
