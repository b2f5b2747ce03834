/** The error body every API failure answers with. */
export interface ApiErrorBody {
  error: {
    code: string;
    message: string;
    details?: unknown;
  };
}

export interface FieldErrorDetails {
  fieldErrors: Record<string, string[]>;
}
