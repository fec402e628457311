import type { ApiKeyInfo } from '../../../../shared/api/v1';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { formErrorsFrom } from '../../../lib/form-errors';

interface Props {
  apiKey: ApiKeyInfo | null;
  pending: boolean;
  error: unknown;
  onConfirm: (key: ApiKeyInfo) => void;
  onClose: () => void;
}

export function RevokeKeyDialog({ apiKey, pending, error, onConfirm, onClose }: Props) {
  return (
    <ConfirmDialog
      open={apiKey !== null}
      title={`Revoke “${apiKey?.name ?? ''}”?`}
      confirmLabel="Revoke the key"
      danger
      pending={pending}
      error={error ? formErrorsFrom(error).summary : undefined}
      onClose={onClose}
      onConfirm={() => apiKey && onConfirm(apiKey)}
    >
      Every call with <code className="font-mono">{apiKey?.prefix}…</code> is refused from the next one on. This cannot be undone: a system that still
      needs access needs a new key.
    </ConfirmDialog>
  );
}
