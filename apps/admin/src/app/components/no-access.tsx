import { ButtonLink } from '../../components/ui/button';
import { paths } from '../../config/paths';

/** The server refuses these pages anyway; this says so plainly instead of showing an error. */
export function NoAccess({ area, who = "the shop's admins" }: { area: string; who?: string }) {
  return (
    <div className="flex max-w-prose flex-col gap-4">
      <title>{`No access to ${area} · Chuckkey`}</title>
      <h1 className="text-2xl font-bold text-neutral-900 md:text-3xl">You don&apos;t have access to {area}</h1>
      <p className="text-neutral-800">
        {area} is for {who}. If you need it for your work in the shop, ask an admin.
      </p>
      <div>
        <ButtonLink to={paths.home.getHref()}>Go to the shop floor</ButtonLink>
      </div>
    </div>
  );
}
