export interface ApiIssue {
  path: string;
  message: string;
}

/**
 * Any failed API call. `status` 0 means the server was not reached; `body` keeps the whole
 * error response so a caller can read extra fields such as the `current` row of a 409.
 */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly issues: ApiIssue[];
  readonly body: unknown;

  constructor(init: { status: number; code: string; message: string; issues?: ApiIssue[]; body?: unknown }) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.issues = init.issues ?? [];
    this.body = init.body;
  }
}
