import { Module } from '@nestjs/common';
import { PartsModule } from '../parts/parts.module';
import { ProductsModule } from '../products/products.module';
import { RegulatoryModule } from '../regulatory/regulatory.module';
import { CompatibilityController } from './compatibility.controller';
import { AssignmentsService } from './assignments.service';
import { CandidatesService } from './candidates.service';
import { EvaluationInputsService } from './evaluation-inputs.service';
import { MatrixService } from './matrix.service';
import { RulePreviewService } from './rule-preview.service';
import { RulesController } from './rules.controller';
import { RulesService } from './rules.service';
import { OffersReader } from './sourcing/offers-reader.service';
import { EvaluationService } from './evaluation.service';
import { BillOfMaterialsService } from './bill-of-materials.service';

@Module({
  imports: [PartsModule, ProductsModule, RegulatoryModule],
  controllers: [RulesController, CompatibilityController],
  providers: [
    RulesService,
    EvaluationInputsService,
    MatrixService,
    CandidatesService,
    RulePreviewService,
    AssignmentsService,
    OffersReader,
    EvaluationService,
    BillOfMaterialsService,
  ],
  exports: [RulesService, EvaluationInputsService, MatrixService, CandidatesService, RulePreviewService, AssignmentsService, EvaluationService],
})
export class CompatibilityModule {}
