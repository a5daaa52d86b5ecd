import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { User } from '../users/user.entity';

/**
 * One saved edit of the compound library. The table is append-only: every add, edit and retirement
 * is a new row with the next `version` of its compound, so no earlier state is ever lost. The current
 * state of a compound is its row with the highest version.
 */
@Entity({ name: 'library_edits' })
@Index('UQ_library_edits_compound_version', ['compoundId', 'version'], { unique: true })
export class LibraryEdit {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** The compound's slug (bundled or added by a supervisor). */
  @Column({ type: 'varchar', length: 64 })
  compoundId: string;

  /** 1 for the compound's first edit, then +1 per save. */
  @Column({ type: 'int' })
  version: number;

  /** The whole compound entry as it validated at the save (the library's raw JSON form). */
  @Column({ type: 'json' })
  document: Record<string, unknown>;

  /** Retired compounds stay here (and in their history) but leave the active library. */
  @Column({ type: 'boolean', default: false })
  retired: boolean;

  @Column({ type: 'uuid' })
  editedBy: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'editedBy', foreignKeyConstraintName: 'FK_library_edits_editor' })
  editor?: User;

  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  editedAt: Date;
}
