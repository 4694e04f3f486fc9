import { createApiClient } from '@nappe/web-kit';
import { env } from '../config/env';

export {
  ApiError,
  NETWORK_ERROR_MESSAGE,
  parseRetryAfter,
  fileNameFrom,
  type ApiClient,
  type DownloadedFile,
  type RequestOptions,
  type UploadOptions,
} from '@nappe/web-kit';

/** The app's one client: the token in memory, the refresh cookie for /api/auth. */
export const api = createApiClient({ basePath: env.apiBasePath });
