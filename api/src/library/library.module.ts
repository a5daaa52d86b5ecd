import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { LibraryController } from './library.controller';
import { LibraryEdit } from './library-edit.entity';
import { LibraryService } from './library.service';

/** The compound library in force: the bundled library with supervisors' edits. */
@Module({
  imports: [TypeOrmModule.forFeature([LibraryEdit])],
  controllers: [LibraryController],
  providers: [LibraryService],
  exports: [LibraryService],
})
export class LibraryModule {}
