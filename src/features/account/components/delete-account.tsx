import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { useNavigate } from 'react-router';
import type { z } from 'zod';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { TextField } from '../../../components/text-field.tsx';
import { deleteAccountFormSchema } from '../../auth/form-schemas.ts';
import { useDeleteAccount } from '../api/delete-account.ts';
import { libraryExportPath } from '../api/import-library.ts';

type DeleteForm = z.infer<typeof deleteAccountFormSchema>;

/** Deleting the account, after the export is offered and the password typed again. */
export function DeleteAccount() {
  const remove = useDeleteAccount();
  const navigate = useNavigate();
  const { register, handleSubmit, formState } = useForm<DeleteForm>({ resolver: zodResolver(deleteAccountFormSchema) });

  async function onSubmit(form: DeleteForm) {
    await remove.mutateAsync(form).then(
      () => navigate('/'),
      () => undefined,
    );
  }

  return (
    <section aria-labelledby="delete-heading" className="rounded-lg border border-danger/40 bg-white p-5 md:col-span-2">
      <h2 id="delete-heading" className="text-lg font-semibold text-danger">
        Delete account
      </h2>
      <p className="mt-2 text-sm">
        This deletes your account and everything in it, for good: every design and all its versions, every burn entry and its photos, your printer profiles and preferences. It cannot be undone.
      </p>
      <form noValidate onSubmit={handleSubmit(onSubmit)} className="mt-3 grid gap-3 md:grid-cols-[1fr_auto] md:items-end">
        <TextField label="Your password, to confirm" type="password" autoComplete="current-password" registration={register('password')} error={formState.errors.password} />
        <div className="flex flex-col gap-2 sm:flex-row">
          <a href={libraryExportPath} download className="inline-flex min-h-10 items-center justify-center rounded-md border border-rule bg-white px-4 py-2 text-sm font-medium hover:bg-ember-50">
            Export my library first
          </a>
          <Button type="submit" variant="danger" disabled={remove.isPending}>
            Delete my account and everything in it
          </Button>
        </div>
      </form>
      {remove.isError && (
        <div className="mt-3">
          <Notice tone="error">{remove.error.message}</Notice>
        </div>
      )}
    </section>
  );
}
