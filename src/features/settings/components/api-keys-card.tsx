import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { TextField } from '../../../components/ui/field';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { applyServerErrors } from '../../../lib/form-errors';
import { apiKeyCreateSchema } from '../../../../shared/schemas/api-keys';
import {
  useApiKeys,
  useCreateApiKey,
  useRevokeApiKey,
  type ApiKey,
  type ApiKeyCreated,
} from '../api/api-keys';

const nameOnly = apiKeyCreateSchema.pick({ name: true });
const errorText = (error: unknown) =>
  error ? (isApiError(error) ? error.message : 'That did not work. Try again.') : null;

/** The farm's keys for telematics feeds: make one (its key shown once), see use, revoke. */
export function ApiKeysCard({ orgId, timeZone }: { orgId: string; timeZone: string }) {
  const keys = useApiKeys(orgId);
  const create = useCreateApiKey(orgId);
  const revoke = useRevokeApiKey(orgId);
  const [made, setMade] = useState<ApiKeyCreated | null>(null);
  const [revoking, setRevoking] = useState<ApiKey | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: zodResolver(nameOnly), defaultValues: { name: '' } });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const res = await create.mutateAsync(values);
      setMade(res.data);
      reset();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['name']));
    }
  });

  return (
    <Card className="flex flex-col gap-4">
      <p className="text-field-700">
        A telematics feed posts engine hours with one of these keys (ISO 15143-3 snapshots or J1939
        logs; the README shows how). A key can only add readings: it reads nothing. Treat it like a
        password and revoke it if it gets out.
      </p>
      {made ? (
        <Alert tone="success" title={`Key “${made.name}” made`}>
          <p>Copy it now: it is shown this once and cannot be shown again.</p>
          <label className="mt-2 block font-bold" htmlFor="new-api-key">
            Your new API key
          </label>
          <input
            id="new-api-key"
            readOnly
            value={made.secret}
            onFocus={(event) => event.currentTarget.select()}
            className="mt-1 w-full rounded-lg border border-field-300 bg-white px-3 py-2 font-mono text-sm text-field-950"
          />
          <Button variant="secondary" className="mt-2" onClick={() => setMade(null)}>
            I have copied it
          </Button>
        </Alert>
      ) : null}
      <form
        onSubmit={submit}
        noValidate
        aria-label="Make an API key"
        className="flex flex-col gap-3"
      >
        {formError ? <Alert>{formError}</Alert> : null}
        <TextField
          label="Key name"
          hint="Say which feed uses it, e.g. Yard telematics gateway"
          autoComplete="off"
          error={errors.name?.message}
          {...register('name')}
        />
        <div>
          <Button type="submit" icon="plus" pending={isSubmitting}>
            Make API key
          </Button>
        </div>
      </form>
      {keys.isPending ? <ListSkeleton rows={2} label="Loading API keys" /> : null}
      {keys.isError ? (
        <ErrorState
          title="The API keys didn't load"
          message={keys.error.message}
          onRetry={() => keys.refetch()}
          retrying={keys.isRefetching}
        />
      ) : null}
      {keys.data?.length === 0 ? <p className="text-field-600">No API keys yet.</p> : null}
      {keys.data?.length ? (
        <ul
          aria-label="API keys"
          className="divide-y divide-field-100 rounded-xl border border-field-200"
        >
          {keys.data.map((key) => (
            <li key={key.id} className="flex flex-col gap-2 p-3 sm:flex-row sm:items-center">
              <div className="min-w-0 flex-1">
                <p className="font-bold text-field-950">{key.name}</p>
                <p className="font-mono text-sm text-field-700">hs_{key.prefix}_…</p>
                <p className="text-sm text-field-600">
                  Made {formatDateTime(key.createdAt, timeZone)}
                  {key.createdBy ? ` by ${key.createdBy}` : ''} ·{' '}
                  {key.lastUsedAt
                    ? `last used ${formatDateTime(key.lastUsedAt, timeZone)}`
                    : 'never used'}
                </p>
              </div>
              <div className="flex flex-wrap items-center gap-2">
                {key.scopes.map((scope) => (
                  <Badge key={scope}>{scope}</Badge>
                ))}
                {key.revokedAt ? (
                  <Badge tone="overdue">Revoked {formatDateTime(key.revokedAt, timeZone)}</Badge>
                ) : (
                  <Button
                    variant="ghost"
                    icon="close"
                    aria-label={`Revoke ${key.name}`}
                    onClick={() => setRevoking(key)}
                  >
                    Revoke
                  </Button>
                )}
              </div>
            </li>
          ))}
        </ul>
      ) : null}
      <ConfirmDialog
        open={revoking !== null}
        title={`Revoke “${revoking?.name ?? ''}”?`}
        confirmLabel="Revoke key"
        pending={revoke.isPending}
        error={errorText(revoke.error)}
        onCancel={() => {
          setRevoking(null);
          revoke.reset();
        }}
        onConfirm={() =>
          revoking && revoke.mutate(revoking.id, { onSuccess: () => setRevoking(null) })
        }
      >
        The feed using it is refused from its next post. The readings it sent stay.
      </ConfirmDialog>
    </Card>
  );
}
