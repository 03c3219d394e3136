import { Link } from 'react-router-dom';
import { paths } from '../../config/paths.ts';

export function NotFoundPage() {
  return (
    <div className="py-16 text-center">
      <h1 className="text-2xl font-semibold">We couldn't find that page</h1>
      <Link to={paths.home.href()} className="mt-4 inline-block text-madder-600 underline">
        Go to the garments
      </Link>
    </div>
  );
}
