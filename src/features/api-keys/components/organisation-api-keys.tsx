import { useState } from 'react';
import type { ApiKeyInfo, CreatedApiKey } from '../../../../shared/api/v1';
import { cardClass, primaryButtonClass } from '../../../components/form-styles';
import { ModalDialog } from '../../../components/modal-dialog';
import { Notice } from '../../../components/notice';
import { formErrorsFrom } from '../../../lib/form-errors';
import { useKeys } from '../api/get-keys';
import type { KeyOwner } from '../api/key-owner';
import { CreateKeyForm } from './create-key-form';
import { KeyTable } from './key-table';
import { NewKeyPanel } from './new-key-panel';
import { RevokeKeyDialog } from './revoke-key-dialog';
import { RotateKeyForm } from './rotate-key-form';
import { UsagePanel } from './usage-panel';

interface Props {
  organisationId: string;
  organisationName: string;
  /** Owners make, rotate and revoke keys; members see them. The server checks this again. */
  canManage: boolean;
}

type Open = { kind: 'create' } | { kind: 'rotate'; key: ApiKeyInfo } | null;

/** A supplier organisation's API keys and their usage, for the organisation page. */
export function OrganisationApiKeys({ organisationId, organisationName, canManage }: Props) {
  const owner: KeyOwner = { organisationId };
  const keys = useKeys(owner);
  const [open, setOpen] = useState<Open>(null);
  const [fresh, setFresh] = useState<{ created: CreatedApiKey; rotated: boolean } | null>(null);
  const [revoking, setRevoking] = useState<ApiKeyInfo | null>(null);
  const [done, setDone] = useState<string>();

  const shown = (created: CreatedApiKey, rotated: boolean) => {
    setOpen(null);
    setDone(undefined);
    setFresh({ created, rotated });
  };

  return (
    <>
      {/* The dialogs come first: their close effect (focus back to the opener) must run before the new key's panel takes focus. */}
      <ModalDialog width="xl" open={open !== null} title={open?.kind === 'rotate' ? `Rotate “${open.key.name}”` : 'A new API key'} onClose={() => setOpen(null)}>
        {() =>
          open?.kind === 'rotate' ? (
            <RotateKeyForm owner={owner} apiKey={open.key} onRotated={(c) => shown(c, true)} onCancel={() => setOpen(null)} />
          ) : (
            <CreateKeyForm owner={owner} onCreated={(c) => shown(c, false)} onCancel={() => setOpen(null)} />
          )
        }
      </ModalDialog>
      <RevokeKeyDialog
        owner={owner}
        apiKey={revoking}
        onClose={() => setRevoking(null)}
        onRevoked={(key) => {
          setRevoking(null);
          setDone(`${key.name} (${key.prefix}…) is revoked; calls with it are refused.`);
          if (fresh?.created.info.id === key.id) setFresh(null);
        }}
      />
      <section aria-labelledby="api-keys-heading" className={cardClass} data-api-keys>
        <div className="flex flex-wrap items-start justify-between gap-3">
          <div className="max-w-2xl">
            <h2 id="api-keys-heading" className="text-xl font-extrabold tracking-tight">
              API keys
            </h2>
            <p className="mt-1 text-sm leading-relaxed text-ink-700">
              Keys let {organisationName}’s own systems call the Pinwork API: a secret key from your servers, a publishable key from the web pages of
              the origins it names.{' '}
              {canManage ? 'Each key is shown once, when it is made.' : `Only an owner of ${organisationName} can make, rotate or revoke keys.`}
            </p>
          </div>
          {canManage && (
            <button type="button" className={primaryButtonClass} onClick={() => setOpen({ kind: 'create' })}>
              New key
            </button>
          )}
        </div>

        <div className="mt-4 grid gap-4">
          {fresh && <NewKeyPanel created={fresh.created} rotated={fresh.rotated} onDone={() => setFresh(null)} />}
          {done && <Notice tone="success">{done}</Notice>}
          {keys.isPending && <p role="status" className="text-sm text-ink-700">Loading the keys…</p>}
          {keys.isError && <Notice tone="error" title="The keys could not be loaded">{formErrorsFrom(keys.error).summary}</Notice>}
          {keys.data && (
            <KeyTable
              keys={keys.data.items}
              caption={`API keys of ${organisationName}`}
              canManage={canManage}
              onRotate={(key) => setOpen({ kind: 'rotate', key })}
              onRevoke={setRevoking}
            />
          )}
        </div>
      </section>

      <section aria-labelledby="api-usage-heading" className={cardClass}>
        <UsagePanel owner={owner} headingId="api-usage-heading" title="API usage" />
      </section>

    </>
  );
}
