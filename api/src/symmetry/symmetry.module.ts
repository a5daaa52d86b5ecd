import { Module } from '@nestjs/common';
import { SymmetryController } from './symmetry.controller';
import { SymmetryService } from './symmetry.service';

/** The structure check of uploaded structures. */
@Module({
  controllers: [SymmetryController],
  providers: [SymmetryService],
})
export class SymmetryModule {}
