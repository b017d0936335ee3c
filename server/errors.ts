// One error type for every refusal; the error middleware turns it into
// { error: { code, message, fields? } }.
export class AppError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const notFound = (what = 'Record') => new AppError(404, 'not_found', `${what} not found`);
export const forbidden = (message = 'Your role does not allow this') =>
  new AppError(403, 'forbidden', message);
export const unauthenticated = () => new AppError(401, 'unauthenticated', 'Sign in first');
export const invalid = (fields: Record<string, string>, message?: string) =>
  new AppError(
    422,
    'invalid',
    message ??
      Object.entries(fields)
        .map(([k, v]) => `${k}: ${v}`)
        .join('; '),
    fields,
  );
