export { api, apiBaseUrl } from './client';
export { createQueryClient } from './query-client';
export { errorCode, errorMessage, errorStatus, fieldErrors } from './api-error';
export type { ApiErrorBody, ApiErrorDetail } from './api-error';
