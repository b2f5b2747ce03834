import { Link } from 'react-router';
import { buttonClasses } from '../../components/ui/button';
import { Page } from '../../components/ui/page';

export function NotFoundPage() {
  return (
    <Page width="narrow" title="That page isn't on the menu" description="The address may be mistyped, or the page may have moved. Nothing you saved is lost.">
      <div className="flex flex-wrap gap-3">
        <Link to="/" className={buttonClasses()}>
          Go to the Kitchen
        </Link>
        <Link to="/foods" className={buttonClasses({ variant: 'secondary' })}>
          Look up a food
        </Link>
      </div>
    </Page>
  );
}
