import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { geometryProblems, loadLibrary, validateCompound, type Compound } from '@siteband/shared';
import { QueryFailedError, type Repository } from 'typeorm';
import { LibraryEdit } from './library-edit.entity';
import type { CurrentEdit } from './library-version';
import { mergeLibrary, type CurrentLibrary } from './merge-library';
import { unknownFields } from './unknown-fields';

/** One compound as the library screens see it: its entry, where it comes from and its latest save. */
export interface CompoundRecord {
  readonly compound: Compound;
  readonly origin: 'bundled' | 'edited' | 'added';
  readonly retired: boolean;
  /** The compound's edit version (0: never edited, the bundled entry). */
  readonly version: number;
  readonly editedBy: string | null;
  readonly editedAt: Date | null;
}

interface LibraryState extends CurrentLibrary {
  readonly rows: number;
  readonly latest: ReadonlyMap<string, LibraryEdit>;
}

/**
 * The compound library in force — the bundled library with supervisors' edits from `library_edits`
 * applied — and the only writer of that table. Every save is validated by the shared code exactly as
 * the bundled library is, plus the geometry check against the symmetry engine.
 */
@Injectable()
export class LibraryService {
  private state: LibraryState | undefined;

  constructor(@InjectRepository(LibraryEdit) private readonly edits: Repository<LibraryEdit>) {}

  /** The current library and the retired ids (the same object until the next save, so rankings reuse their index). */
  async current(): Promise<CurrentLibrary> {
    return this.load();
  }

  /** One compound, retired ones included; 404 when the id was never in the library. */
  async find(id: string): Promise<CompoundRecord> {
    const state = await this.load();
    const record = recordOf(id, state);
    if (!record) throw new NotFoundException(`No compound has the id ${id}`);
    return record;
  }

  /** Every saved edit of a compound, oldest first (the bundled entry itself is not a row). */
  async history(id: string): Promise<LibraryEdit[]> {
    await this.find(id);
    return this.edits.find({ where: { compoundId: id }, order: { version: 'ASC' } });
  }

  /** Adds a compound; 409 when the id is taken (also by a retired compound), 400 with reasons when invalid. */
  async add(raw: unknown, userId: string): Promise<CompoundRecord> {
    const state = await this.load();
    const id = idOf(raw);
    if (id !== undefined && recordOf(id, state)) {
      throw new ConflictException(`A compound with the id ${id} is already in the library; change it with PUT /api/library/${id}`);
    }
    const compound = this.check(raw, state);
    return this.append(compound.id, compound as unknown as Record<string, unknown>, false, userId, state);
  }

  /** Replaces a compound's entry (a retired compound comes back); 404 for an unknown id, 400 with reasons when invalid. */
  async update(id: string, raw: unknown, userId: string): Promise<CompoundRecord> {
    const state = await this.load();
    if (!recordOf(id, state)) throw new NotFoundException(`No compound has the id ${id}`);
    const bodyId = idOf(raw);
    if (bodyId !== id) throw invalid([`the entry's id must be ${id} (the id in the path), got ${JSON.stringify(bodyId ?? null)}`]);
    const compound = this.check(raw, state);
    return this.append(id, compound as unknown as Record<string, unknown>, false, userId, state);
  }

  /** Retires a compound (a new row, nothing deleted); 409 when already retired or another entry depends on it. */
  async retire(id: string, userId: string): Promise<CompoundRecord> {
    const state = await this.load();
    const record = recordOf(id, state);
    if (!record) throw new NotFoundException(`No compound has the id ${id}`);
    if (record.retired) throw new ConflictException(`The compound ${id} is already retired`);
    const document = record.compound as unknown as Record<string, unknown>;
    try {
      mergeLibrary(loadLibrary(), [...currentEdits(state), { compoundId: id, version: record.version + 1, document, retired: true, editedAt: new Date() }]);
    } catch (error) {
      if (error instanceof TypeError) throw new ConflictException(`The compound ${id} cannot be retired: ${error.message}`);
      throw error;
    }
    return this.append(id, document, true, userId, state);
  }

  /** validateCompound, no unknown fields, the engine's Γvib check, then the whole library with the entry in place. */
  private check(raw: unknown, state: LibraryState): Compound {
    const bundled = loadLibrary();
    let compound: Compound;
    try {
      compound = validateCompound(raw, new Set(Object.keys(bundled.sources)));
    } catch (error) {
      if (error instanceof TypeError) throw invalid([error.message]);
      throw error;
    }
    const unknown = unknownFields(raw, compound);
    if (unknown.length > 0) throw invalid(unknown.map((field) => `${field} is not a field of a compound entry`));
    const problems = geometryProblems(compound);
    if (problems.length > 0) throw invalid(problems);
    const others = currentEdits(state).filter((edit) => edit.compoundId !== compound.id);
    try {
      mergeLibrary(bundled, [...others, { compoundId: compound.id, version: 1, document: compound as unknown as Record<string, unknown>, retired: false, editedAt: new Date() }]);
    } catch (error) {
      if (error instanceof TypeError) throw invalid([error.message]);
      throw error;
    }
    return compound;
  }

  private async append(compoundId: string, document: Record<string, unknown>, retired: boolean, userId: string, state: LibraryState): Promise<CompoundRecord> {
    const version = (state.latest.get(compoundId)?.version ?? 0) + 1;
    try {
      await this.edits.save(this.edits.create({ compoundId, version, document, retired, editedBy: userId }));
    } catch (error) {
      // Another save of the same compound took this version first: the unique index decides.
      if (isDuplicateKey(error)) throw new ConflictException(`The compound ${compoundId} was saved by someone else at the same moment; reload it and try again`);
      throw error;
    }
    this.state = undefined;
    return this.find(compoundId);
  }

  /**
   * The merged library, rebuilt only when `library_edits` changed. The table is append-only, so its row
   * count identifies its content; asking for it keeps several API processes consistent.
   */
  private async load(): Promise<LibraryState> {
    const rows = await this.edits.count();
    if (this.state?.rows === rows) return this.state;
    const latestRows: LibraryEdit[] = await this.edits
      .createQueryBuilder('edit')
      .innerJoin(
        (sub) => sub.select('last.compoundId', 'compoundId').addSelect('MAX(last.version)', 'version').from(LibraryEdit, 'last').groupBy('last.compoundId'),
        'newest',
        'newest.compoundId = edit.compoundId AND newest.version = edit.version',
      )
      .getMany();
    const latest = new Map(latestRows.map((row) => [row.compoundId, row]));
    const merged = mergeLibrary(loadLibrary(), [...latest.values()]);
    this.state = { ...merged, rows, latest };
    return this.state;
  }
}

function currentEdits(state: LibraryState): CurrentEdit[] {
  return [...state.latest.values()];
}

function recordOf(id: string, state: LibraryState): CompoundRecord | undefined {
  const edit = state.latest.get(id);
  const bundled = loadLibrary().compounds.find((c) => c.id === id);
  if (!edit && !bundled) return undefined;
  const active = state.library.compounds.find((c) => c.id === id);
  return {
    // A retired compound keeps the entry it had when it was retired (stored and validated then).
    compound: active ?? (edit?.document as unknown as Compound) ?? bundled!,
    origin: !edit ? 'bundled' : bundled ? 'edited' : 'added',
    retired: edit?.retired ?? false,
    version: edit?.version ?? 0,
    editedBy: edit?.editedBy ?? null,
    editedAt: edit?.editedAt ?? null,
  };
}

function idOf(raw: unknown): string | undefined {
  const id = typeof raw === 'object' && raw !== null ? (raw as { id?: unknown }).id : undefined;
  return typeof id === 'string' ? id : undefined;
}

function invalid(reasons: string[]): BadRequestException {
  return new BadRequestException({
    message: `The compound was not saved: ${reasons.join('; ')}`,
    details: [{ field: 'compound', messages: reasons }],
  });
}

function isDuplicateKey(error: unknown): boolean {
  return error instanceof QueryFailedError && (error.driverError as { code?: string } | undefined)?.code === 'ER_DUP_ENTRY';
}
