import { ErrorState } from '../components/ErrorState';
import { ApiError } from '../lib/api';

export function NotFoundRoute() {
  return <ErrorState error={new ApiError(404, 'not_found', 'No screen lives at this address.')} />;
}
