import { useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { inputClass, linkClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { formErrorsFrom } from '../../../lib/form-errors';
import { useMyOrganisations, type MyOrganisation as Membership } from '../api/get-my-organisations';
import { OrganisationMembers } from './organisation-members';

const kindLabel = { supplier: 'Supplier organisation', engineering: 'Engineering organisation' } as const;

/** The organisations the signed-in person belongs to; most people have one. */
export function MyOrganisation({ currentUserId, isAdmin, more }: { currentUserId: string; isAdmin: boolean; /** Sections other features add for the organisation shown (composed in src/app). */ more?: (organisation: Membership) => ReactNode }) {
  const mine = useMyOrganisations();
  const [chosen, setChosen] = useState<string>('');

  if (mine.isPending) return <p role="status" className="text-ink-700">Loading your organisation…</p>;
  if (mine.isError) return <Notice tone="error" title="Your organisation could not be loaded">{formErrorsFrom(mine.error).summary}</Notice>;
  const items = mine.data.items;
  if (items.length === 0) {
    return (
      <Notice title="You are not a member of an organisation">
        An owner of an organisation can invite you by e-mail; the link in that message brings you back here.{' '}
        {isAdmin && (
          <>
            Every organisation is listed in the <Link to="/admin/organisations" className={linkClass}>admin area</Link>.
          </>
        )}
      </Notice>
    );
  }
  const current = items.find((o) => o.id === chosen) ?? items[0]!;
  return (
    <div className="grid gap-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm font-bold tracking-wide text-ink-600 uppercase">{kindLabel[current.kind]}</p>
          <h2 className="text-2xl font-extrabold tracking-tight text-ink-950" data-organisation-name>
            {current.name}
          </h2>
          <p className="text-sm text-ink-700">You are {current.role === 'owner' ? 'an owner' : 'a member'}.</p>
        </div>
        {items.length > 1 && (
          <div className="w-full sm:w-72">
            <label htmlFor="organisation-choice" className="block text-sm font-bold text-ink-900">
              Organisation
            </label>
            <select id="organisation-choice" value={current.id} onChange={(e) => setChosen(e.target.value)} className={`${inputClass} mt-1.5`}>
              {items.map((o) => (
                <option key={o.id} value={o.id}>
                  {o.name}
                </option>
              ))}
            </select>
          </div>
        )}
      </div>
      <OrganisationMembers key={current.id} organisationId={current.id} currentUserId={currentUserId} canManage={current.role === 'owner' || isAdmin} />
      {more?.(current)}
    </div>
  );
}
