import { ButtonLink } from '../../components/ui/button';
import { PageHeading } from '../../components/ui/page-heading';
import { paths } from '../../config/paths';

export default function NotFoundRoute() {
  return (
    <>
      <PageHeading title="There is no such page" description="The address may be mistyped, or the page has moved." />
      <div>
        <ButtonLink to={paths.home.getHref()}>Go to the shop floor</ButtonLink>
      </div>
    </>
  );
}
