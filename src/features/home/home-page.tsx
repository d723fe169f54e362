import { Link } from 'react-router';
import { Page } from '../../components/page.tsx';
import { SignInLink } from '../../components/sign-in-link.tsx';
import { useAccount } from '../account/api/get-account.ts';

const steps = [
  ['Size the air', 'Primary holes in the bottom against secondary jets near the top, as a ratio you set.'],
  ['Lay out the holes', 'Even pitch around the can wall and rings on the can bottom, clear of seams and rims.'],
  ['Check the rules of thumb', 'Jet pitch, metal left between holes, distance from edges, holes that do not fit.'],
  ['Print true to scale', 'A wrap strip and a bottom disc with a ruler to check before you punch and drill.'],
] as const;

export function HomePage() {
  const { data: account } = useAccount();
  return (
    <Page title="Canwright" width="wide" intro="Canwright sizes the air holes of a wood-gas can stove, lays them out evenly, checks them, and prints true-scale templates to tape on the can and drill through.">
      {/* The way in comes first, so a phone shows it without scrolling. */}
      <div className="flex flex-wrap gap-3">
        <Link to="/design" className="rounded-md bg-ember-600 px-4 py-2 font-medium text-white hover:bg-ember-700">
          Start designing
        </Link>
        {account ? (
          <Link to="/library" className="rounded-md border border-rule bg-white px-4 py-2 font-medium hover:bg-ember-50">
            Your library
          </Link>
        ) : (
          <>
            <Link to="/sign-up" className="rounded-md border border-rule bg-white px-4 py-2 font-medium hover:bg-ember-50">
              Create an account
            </Link>
            <SignInLink className="rounded-md border border-rule bg-white px-4 py-2 font-medium hover:bg-ember-50">Sign in</SignInLink>
          </>
        )}
      </div>
      <ol className="mt-8 grid gap-4 sm:grid-cols-2">
        {steps.map(([title, text], index) => (
          <li key={title} className="rounded-lg border border-rule bg-white p-5">
            <p className="text-sm font-medium text-ember-700">Step {index + 1}</p>
            <h2 className="mt-1 font-semibold">{title}</h2>
            <p className="mt-1 text-sm text-ink-soft">{text}</p>
          </li>
        ))}
      </ol>
    </Page>
  );
}
