import { useLiveQuery } from 'dexie-react-hooks';
import type { DeleteBlock, HeldEntity } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import type { TFunction } from 'i18next';
import { captureDb } from '../../features/cases/captureDb';
import { deleteBlockOnTablet, deleteUnheld, DeleteHeldError } from '../../features/sync/deleteHeld';
import { ConfirmDelete } from './ConfirmDelete';

/** What holds the record, in words: the counts, then why it can never go (a permanent record) or what to delete first. */
function heldMessage(t: TFunction, language: string, entity: HeldEntity, block: DeleteBlock): string {
  const list = new Intl.ListFormat(language, { type: 'conjunction' });
  const counts = list.format(block.held.map((h) => t(`editing.held.count.${h.kind}`, { count: h.count })));
  const kinds = (of: readonly string[]) => list.format(of.map((kind) => t(`editing.held.kinds.${kind}`)));
  const next =
    block.permanent.length > 0
      ? t(`editing.held.never.${entity}`, { kinds: kinds(block.permanent) })
      : t(`editing.held.first.${entity}`, { kinds: kinds(block.held.map((h) => h.kind)) });
  return `${t(`editing.held.intro.${entity}`, { counts })} ${next}`;
}

/**
 * The Delete action of a case, sample or scan: while records below hold it, a tap says plainly what
 * (nothing is queued that the server would refuse); otherwise it asks, deletes, and leaves the page.
 */
export function DeleteHeldRecord({
  entity,
  id,
  question,
  consequence,
  onDeleted,
}: {
  entity: HeldEntity;
  id: string;
  question: string;
  consequence: string;
  onDeleted: () => void;
}) {
  const { t, i18n } = useTranslation();
  const block = useLiveQuery(() => deleteBlockOnTablet(captureDb(), entity, id).catch(() => null), [entity, id]);
  return (
    <ConfirmDelete
      question={question}
      consequence={consequence}
      testId={`delete-${entity}`}
      refusal={block ? heldMessage(t, i18n.language, entity, block) : undefined}
      onDelete={async () => {
        try {
          await deleteUnheld(captureDb(), entity, id);
        } catch (failure) {
          if (failure instanceof DeleteHeldError) throw new Error(heldMessage(t, i18n.language, entity, failure.block), { cause: failure });
          throw failure;
        }
        onDeleted();
      }}
    />
  );
}
