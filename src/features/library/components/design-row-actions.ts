import { useQueryClient } from '@tanstack/react-query';
import { createContext, useContext, useId, useState } from 'react';
import { useNavigate } from 'react-router';
import type { DesignListItem } from '../../../../shared/library/library-schemas.ts';
import { useAccount } from '../../account/api/get-account.ts';
import { openDesign } from '../../designer/open-design.ts';
import { useDeleteDesign } from '../api/delete-design.ts';
import { designQueryOptions } from '../api/get-design.ts';
import { useDuplicateDesign } from '../api/duplicate-design.ts';
import { useUpdateDesign } from '../api/update-design.ts';

/** What one library row can do, shared by its cells (the name cell renames, the actions cell starts it). */
export interface DesignRowActions {
  design: DesignListItem;
  /** Names the row for its buttons: the link, or the rename form's label while renaming. */
  nameId: string;
  /** The name being typed, or undefined when not renaming. */
  renaming: string | undefined;
  setRenaming(name: string | undefined): void;
  confirming: boolean;
  setConfirming(on: boolean): void;
  problem: string | undefined;
  busy: boolean;
  open(): Promise<void>;
  rename(name: string): Promise<void>;
  duplicate(): Promise<void>;
  remove(): Promise<void>;
}

/** Holds one row's state and requests; a failed request shows its message in the row. */
export function useDesignRowActions(design: DesignListItem): DesignRowActions {
  const nameId = useId();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const { data: account } = useAccount();
  const update = useUpdateDesign();
  const duplicate = useDuplicateDesign();
  const remove = useDeleteDesign();
  const [renaming, setRenaming] = useState<string>();
  const [confirming, setConfirming] = useState(false);
  const [problem, setProblem] = useState<string>();

  async function run(action: () => Promise<unknown>) {
    setProblem(undefined);
    try {
      await action();
    } catch (error) {
      setProblem((error as Error).message);
    }
  }

  return {
    design,
    nameId,
    renaming,
    setRenaming,
    confirming,
    setConfirming,
    problem,
    busy: update.isPending || duplicate.isPending || remove.isPending,
    open: () =>
      run(async () => {
        const detail = await queryClient.fetchQuery(designQueryOptions(design.id));
        openDesign(detail.document, { savedId: design.id, accountId: account?.id, reason: `opened “${detail.name}” from your library` });
        await navigate('/design');
      }),
    rename: (name) =>
      run(async () => {
        await update.mutateAsync({ id: design.id, change: { name } });
        setRenaming(undefined);
      }),
    duplicate: () => run(() => duplicate.mutateAsync(design.id)),
    remove: () => run(() => remove.mutateAsync(design.id)),
  };
}

export const DesignRowContext = createContext<DesignRowActions | undefined>(undefined);

/** The row a cell is in; cells are rendered by the table, so the row hands its state down this way. */
export function useDesignRow(): DesignRowActions {
  const row = useContext(DesignRowContext);
  if (!row) throw new Error('A design cell must be inside a DesignRow');
  return row;
}
