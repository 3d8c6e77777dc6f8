import { Module } from '@nestjs/common';
import { CatalogueSearchService } from './catalogue/catalogue-index/catalogue-search.service';
import { DocumentsController } from './documents/documents.controller';
import { DocumentsService } from './documents/documents.service';
import { MeasurementsController } from './measurements/measurements.controller';
import { MeasurementsService } from './measurements/measurements.service';
import { PartCsvService } from './import-export/part-csv.service';
import { PartDataService } from './part-data.service';
import { PartsController } from './catalogue/parts.controller';
import { PartsService } from './catalogue/parts.service';
import { ReviewController } from './review/review.controller';
import { ReviewService } from './review/review.service';
import { SourcingController } from './sourcing/sourcing.controller';
import { SourcingService } from './sourcing/sourcing.service';

@Module({
  // ReviewController first: its static `parts/review-queue` must win over `parts/:id`.
  controllers: [ReviewController, PartsController, MeasurementsController, DocumentsController, SourcingController],
  providers: [PartsService, ReviewService, MeasurementsService, DocumentsService, SourcingService, CatalogueSearchService, PartCsvService, PartDataService],
  exports: [PartsService, PartDataService, CatalogueSearchService, MeasurementsService, DocumentsService, SourcingService],
})
export class PartsModule {}
