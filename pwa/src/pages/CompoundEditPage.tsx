import { useEffect, useState, type FormEvent } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { arrowBackOutline, saveOutline } from 'ionicons/icons';
import { useLocation, useNavigate, useParams } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { PageShell } from '../components/PageShell';
import { BandsEditor } from '../components/library/BandsEditor';
import { GeometryEditor } from '../components/library/GeometryEditor';
import { HazardsEditor } from '../components/library/HazardsEditor';
import { MainFieldsEditor } from '../components/library/MainFieldsEditor';
import { ServerReasons } from '../components/library/ServerReasons';
import '../components/library/library.css';
import '../components/structure/structure.css';
import { ApiError } from '../features/api/apiError';
import { canCurateLibrary } from '../features/library/canCurate';
import { blankDraft, draftOf, type CompoundDraft } from '../features/library/compoundDraft';
import { libraryPaths } from '../features/library/libraryPaths';
import { useSaveCompound } from '../features/library/useCompoundMutations';
import { useCompoundValidation } from '../features/library/useCompoundValidation';
import { useCompound } from '../features/library/useLibrary';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { useSession } from '../features/session/SessionProvider';

/** The supervisor's editor: change a compound, add one from a blank form or as a copy, checked live, saved through the API. */
export default function CompoundEditPage() {
  const { t } = useTranslation();
  const { id: routeId } = useParams();
  const location = useLocation();
  const paths = libraryPaths(location.pathname);
  const navigate = useNavigate();
  const online = useOnlineStatus();
  const { session } = useSession();
  const isNew = routeId === undefined;
  const copyOf = isNew ? new URLSearchParams(location.search).get('from') : null;
  const baseId = isNew ? (copyOf ?? '') : routeId;
  const { compound: base, query } = useCompound(baseId);
  const library = query.data?.library;
  const [draft, setDraft] = useState<CompoundDraft>();
  const save = useSaveCompound();
  // A blank form keeps nothing of another entry; a copy and an edit keep what the form does not show.
  const kept = isNew && !copyOf ? undefined : base;
  const check = useCompoundValidation(draft, kept, library);

  // The form starts once the library is there: blank, from the stored entry, or a copy needing its own id.
  useEffect(() => {
    if (draft || !library) return;
    if (isNew && !copyOf) setDraft(blankDraft());
    else if (base) setDraft(isNew ? { ...draftOf(base), id: '', name: '' } : draftOf(base));
  }, [base, draft, isNew, copyOf, library]);

  // The server's reasons describe the entry as it was sent: once the form changes they are stale.
  const { reset } = save;
  useEffect(() => reset(), [draft, reset]);

  if (!canCurateLibrary(session?.user.role)) {
    return (
      <PageShell title={t('library.editor.title')}>
        <p className="sb-error" role="alert">{t('library.editor.notAllowed')}</p>
      </PageShell>
    );
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    if (!draft || !check.entry || !check.ready) return;
    save.mutate(
      { id: draft.id, entry: check.entry, isNew },
      { onSuccess: (record) => navigate(paths.compound(String(record.compound.id ?? draft.id)), { replace: true }) },
    );
  }

  const serverReasons = save.error instanceof ApiError ? save.error.details : save.error ? [save.error.message] : [];
  const sources = library?.sources ?? {};
  const title = isNew ? t('library.editor.addTitle') : t('library.editor.editTitle', { name: base?.name ?? baseId });

  return (
    <PageShell title={title}>
      <IonButton fill="outline" routerLink={base ? paths.compound(base.id) : paths.list} routerDirection="back" className="sb-back">
        <IonIcon icon={arrowBackOutline} slot="start" aria-hidden="true" />
        {t('library.editor.back')}
      </IonButton>
      {query.data && baseId !== '' && !base && <p className="sb-error" role="alert">{t('library.detail.unknown', { id: baseId })}</p>}
      {draft && library && (
        <form onSubmit={submit} noValidate className="sb-editor">
          <section className="sb-panel" aria-labelledby="editor-main-heading">
            <h2 id="editor-main-heading" className="sb-panel__heading">{t('library.editor.mainFields')}</h2>
            {isNew && base && <p className="sb-muted">{t('library.editor.copyHint', { name: base.name })}</p>}
            {isNew && !base && <p className="sb-muted">{t('library.editor.blankHint')}</p>}
            <p className="sb-muted">{t('library.editor.sourcesHint')}</p>
            <MainFieldsEditor draft={draft} onChange={setDraft} isNew={isNew} sources={sources} />
          </section>
          <GeometryEditor draft={draft} onChange={setDraft} check={check} sources={sources} />
          <BandsEditor draft={draft} onChange={setDraft} sources={sources} />
          <HazardsEditor value={draft.hazards} onChange={(hazards) => setDraft({ ...draft, hazards })} sources={sources} name={draft.name} />
          <section className="sb-panel sb-editor__save" aria-labelledby="editor-save-heading">
            <h2 id="editor-save-heading" className="sb-panel__heading">{t('library.editor.saveHeading')}</h2>
            {check.entryError && (
              <p className="sb-error" role="alert" data-testid="entry-error">
                {t('library.editor.entryError', { message: check.entryError })}
              </p>
            )}
            <ServerReasons reasons={serverReasons} />
            {!online && <p className="sb-notice">{t('library.editor.offline')}</p>}
            <IonButton type="submit" className="sb-primary" disabled={!online || !check.ready || save.isPending}>
              <IonIcon icon={saveOutline} slot="start" aria-hidden="true" />
              {save.isPending ? t('library.editor.saving') : t('library.editor.save')}
            </IonButton>
          </section>
        </form>
      )}
    </PageShell>
  );
}
