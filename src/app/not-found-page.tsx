import { Link } from 'react-router';
import { Page } from '../components/page.tsx';

export function NotFoundPage() {
  return (
    <Page title="Page not found">
      <p>
        There is nothing at this address.{' '}
        <Link to="/" className="text-ember-700 underline">
          Go to the start page
        </Link>
        .
      </p>
    </Page>
  );
}
