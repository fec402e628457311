import { useEffect } from 'react';
import type { ApiKeyInfo } from '../../../../shared/api/v1';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { formErrorsFrom } from '../../../lib/form-errors';
import type { KeyOwner } from '../api/key-owner';
import { useRevokeKey } from '../api/revoke-key';

interface Props {
  owner: KeyOwner;
  /** The key to ask about; null keeps the dialog closed. */
  apiKey: ApiKeyInfo | null;
  onRevoked: (key: ApiKeyInfo) => void;
  onClose: () => void;
}

/** Asks before revoking a key, revokes it, and says why not if the server refuses. */
export function RevokeKeyDialog({ owner, apiKey, onRevoked, onClose }: Props) {
  const revoke = useRevokeKey(owner);
  const { reset } = revoke;
  // Each key asked about starts without the previous one's error.
  useEffect(() => reset(), [apiKey, reset]);
  return (
    <ConfirmDialog
      open={apiKey !== null}
      title={`Revoke “${apiKey?.name ?? ''}”?`}
      confirmLabel="Revoke the key"
      danger
      pending={revoke.isPending}
      error={revoke.error ? formErrorsFrom(revoke.error).summary : undefined}
      onClose={onClose}
      onConfirm={() => apiKey && revoke.mutate(apiKey.id, { onSuccess: () => onRevoked(apiKey) })}
    >
      Every call with <code className="font-mono">{apiKey?.prefix}…</code> is refused from the next one on. This cannot be undone: a system that still
      needs access needs a new key.
    </ConfirmDialog>
  );
}
