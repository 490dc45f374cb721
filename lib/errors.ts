export type ErrorCode =
  | "validation_failed"
  | "unauthenticated"
  | "forbidden"
  | "forbidden_origin"
  | "not_found"
  | "conflict"
  | "rate_limited"
  | "email_not_verified"
  | "unavailable";

const statusByCode: Record<ErrorCode, number> = {
  validation_failed: 400,
  unauthenticated: 401,
  forbidden: 403,
  forbidden_origin: 403,
  email_not_verified: 403,
  not_found: 404,
  conflict: 409,
  rate_limited: 429,
  unavailable: 503,
};

export interface AppErrorOptions {
  field?: string;
  fields?: Record<string, string>;
  retryAfterSeconds?: number;
  /** What the person can pick from to go on (several parts with one number, the serial ranges of an assembly). */
  choices?: unknown[];
}

/** The one error type that lib/ throws for the caller to see; anything else is a bug and becomes a 500. */
export class AppError extends Error {
  readonly code: ErrorCode;
  readonly options: AppErrorOptions;

  constructor(code: ErrorCode, message: string, options: AppErrorOptions = {}) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.options = options;
  }

  get status(): number {
    return statusByCode[this.code];
  }
}

export interface ErrorBody {
  error: ErrorCode | "internal";
  message: string;
  field?: string;
  fields?: Record<string, string>;
  choices?: unknown[];
}

export function errorBody(error: AppError): ErrorBody {
  const { field, fields, choices } = error.options;
  return {
    error: error.code,
    message: error.message,
    ...(field ? { field } : {}),
    ...(fields ? { fields } : {}),
    ...(choices ? { choices } : {}),
  };
}
