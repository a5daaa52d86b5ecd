import { useEffect, useId, useState, type FormEvent } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { arrowBackOutline, saveOutline } from 'ionicons/icons';
import { useLocation, useNavigate, useParams } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { PageShell } from '../components/PageShell';
import { FundamentalsEditor } from '../components/library/FundamentalsEditor';
import { LiveStructureCheck } from '../components/library/LiveStructureCheck';
import '../components/library/library.css';
import '../components/structure/structure.css';
import { ApiError } from '../features/api/apiError';
import { canCurateLibrary } from '../features/library/canCurate';
import { draftOf, type CompoundDraft } from '../features/library/compoundDraft';
import { libraryPaths } from '../features/library/libraryPaths';
import { useSaveCompound } from '../features/library/useCompoundMutations';
import { useCompoundValidation } from '../features/library/useCompoundValidation';
import { useCompound } from '../features/library/useLibrary';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { useSession } from '../features/session/SessionProvider';

/** The supervisor's editor: change a compound (or add one copied from another), checked live, saved through the API. */
export default function CompoundEditPage() {
  const { t } = useTranslation();
  const fieldId = useId();
  const { id: routeId } = useParams();
  const location = useLocation();
  const paths = libraryPaths(location.pathname);
  const navigate = useNavigate();
  const online = useOnlineStatus();
  const { session } = useSession();
  const isNew = routeId === undefined;
  const baseId = isNew ? (new URLSearchParams(location.search).get('from') ?? '') : routeId;
  const { compound: base, query } = useCompound(baseId);
  const [draft, setDraft] = useState<CompoundDraft>();
  const save = useSaveCompound();
  const check = useCompoundValidation(draft, base, query.data?.library);

  // The form starts from the stored entry once the library is there; a copy needs its own id.
  useEffect(() => {
    if (base && !draft) setDraft(isNew ? { ...draftOf(base), id: '', name: '' } : draftOf(base));
  }, [base, draft, isNew]);

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

  const field = (key: 'id' | 'name' | 'cas' | 'formula', label: string) =>
    draft && (
      <div className="sb-field">
        <label htmlFor={`${fieldId}-${key}`}>{label}</label>
        <input id={`${fieldId}-${key}`} className="sb-native-input" value={draft[key]} onChange={(e) => setDraft({ ...draft, [key]: e.target.value })} />
      </div>
    );
  const serverReasons = save.error instanceof ApiError ? save.error.details : save.error ? [save.error.message] : [];

  return (
    <PageShell title={isNew ? t('library.editor.addTitle') : t('library.editor.editTitle', { name: base?.name ?? baseId })}>
      <IonButton fill="outline" routerLink={base ? paths.compound(base.id) : paths.list} routerDirection="back" className="sb-back">
        <IonIcon icon={arrowBackOutline} slot="start" aria-hidden="true" />
        {t('library.editor.back')}
      </IonButton>
      {query.data && !base && <p className="sb-error" role="alert">{t('library.detail.unknown', { id: baseId })}</p>}
      {draft && base && (
        <form onSubmit={submit} noValidate>
          <section className="sb-panel" aria-labelledby="editor-main-heading">
            <h2 id="editor-main-heading" className="sb-panel__heading">{t('library.editor.mainFields')}</h2>
            {isNew && <p className="sb-muted">{t('library.editor.copyHint', { name: base.name })}</p>}
            <div className="sb-form-grid">
              {isNew && field('id', t('library.editor.id'))}
              {field('name', t('library.editor.name'))}
              {field('cas', t('library.detail.cas'))}
              {field('formula', t('library.detail.formula'))}
              <div className="sb-field sb-form-grid__wide">
                <label htmlFor={`${fieldId}-synonyms`}>{t('library.editor.synonyms')}</label>
                <textarea
                  id={`${fieldId}-synonyms`}
                  className="sb-native-input"
                  rows={3}
                  value={draft.synonyms}
                  onChange={(e) => setDraft({ ...draft, synonyms: e.target.value })}
                  aria-describedby={`${fieldId}-synonyms-hint`}
                />
                <p id={`${fieldId}-synonyms-hint`} className="sb-muted">{t('library.editor.synonymsHint')}</p>
              </div>
            </div>
            <p className="sb-muted">{t('library.editor.keptHint')}</p>
          </section>
          {base.geometry && (
            <section className="sb-panel" aria-labelledby="editor-geometry-heading">
              <h2 id="editor-geometry-heading" className="sb-panel__heading">{t('library.editor.geometry')}</h2>
              <div className="sb-structure-layout sb-structure-layout--split">
                <div>
                  <div className="sb-field">
                    <label htmlFor={`${fieldId}-xyz`}>{t('library.editor.xyz')}</label>
                    <textarea id={`${fieldId}-xyz`} className="sb-native-input sb-mono sb-structure-text" rows={8} spellCheck={false} value={draft.xyz} onChange={(e) => setDraft({ ...draft, xyz: e.target.value })} />
                  </div>
                  <fieldset className="sb-choice">
                    <legend>{t('library.structure.conventionLabel')}</legend>
                    <div className="sb-choice__options">
                      {(['yz', 'xz'] as const).map((value) => (
                        <label key={value} className="sb-choice__option">
                          <input type="radio" name={`${fieldId}-convention`} checked={draft.convention === value} onChange={() => setDraft({ ...draft, convention: value })} />
                          {t(`library.structure.convention_${value}`)}
                        </label>
                      ))}
                    </div>
                  </fieldset>
                </div>
                <LiveStructureCheck outcome={check.structure.data} error={check.structure.error} running={check.structure.isFetching} problems={check.problems} />
              </div>
              <FundamentalsEditor rows={draft.fundamentals} onChange={(fundamentals) => setDraft({ ...draft, fundamentals })} />
            </section>
          )}
          <section className="sb-panel" aria-labelledby="editor-save-heading">
            <h2 id="editor-save-heading" className="sb-panel__heading">{t('library.editor.saveHeading')}</h2>
            {check.entryError && (
              <p className="sb-error" role="alert" data-testid="entry-error">
                {t('library.editor.entryError', { message: check.entryError })}
              </p>
            )}
            {serverReasons.length > 0 && (
              <div className="sb-error" role="alert" data-testid="server-error">
                <p>{t('library.editor.serverError')}</p>
                <ul>
                  {serverReasons.map((r) => (
                    <li key={r}>{r}</li>
                  ))}
                </ul>
              </div>
            )}
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
