/** The payments API's error body: `{ error: { type, message, code?, param? } }`. */
export type ApiErrorBody = {
  type: "invalid_request_error" | "api_error" | "card_error";
  message: string;
  code?: string;
  param?: string;
  decline_code?: string;
};

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly body: ApiErrorBody,
  ) {
    super(body.message);
  }

  static missing(param: string): ApiError {
    return new ApiError(400, {
      type: "invalid_request_error",
      code: "parameter_missing",
      message: `Missing required param: ${param}.`,
      param,
    });
  }

  static invalid(param: string, expected: string, code = "parameter_invalid"): ApiError {
    return new ApiError(400, {
      type: "invalid_request_error",
      code,
      message: `Invalid ${param}: must be ${expected}.`,
      param,
    });
  }

  static request(message: string, param?: string): ApiError {
    return new ApiError(400, { type: "invalid_request_error", message, ...(param ? { param } : {}) });
  }

  /** Real messages read "No such price: 'price_123'"; the SDK maps 404 to its invalid-request error class. */
  static notFound(kind: string, id: string, param = "id"): ApiError {
    return new ApiError(404, {
      type: "invalid_request_error",
      code: "resource_missing",
      message: `No such ${kind}: '${id}'`,
      param,
    });
  }

  static unauthorized(): ApiError {
    return new ApiError(401, {
      type: "invalid_request_error",
      message:
        "You did not provide an API key. Send it as a Bearer token in the Authorization header (for example `Authorization: Bearer sk_test_...`).",
    });
  }

  static unknownRoute(method: string, path: string): ApiError {
    return new ApiError(404, {
      type: "invalid_request_error",
      message: `Unrecognized request URL (${method}: ${path}). The payments stand-in implements only part of the API; see dev/payments-standin/README.md.`,
    });
  }
}
