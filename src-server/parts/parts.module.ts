import { Module } from '@nestjs/common';
import { CatalogueSearchService } from './catalogue-index/catalogue-search.service';
import { DocumentsController } from './documents.controller';
import { DocumentsService } from './documents.service';
import { MeasurementsController } from './measurements.controller';
import { MeasurementsService } from './measurements.service';
import { PartCsvService } from './part-csv.service';
import { PartDataService } from './part-data.service';
import { PartsController } from './parts.controller';
import { PartsService } from './parts.service';
import { ReviewController } from './review.controller';
import { ReviewService } from './review.service';
import { SourcingController } from './sourcing.controller';
import { SourcingService } from './sourcing.service';

@Module({
  // ReviewController first: its static `parts/review-queue` must win over `parts/:id`.
  controllers: [ReviewController, PartsController, MeasurementsController, DocumentsController, SourcingController],
  providers: [PartsService, ReviewService, MeasurementsService, DocumentsService, SourcingService, CatalogueSearchService, PartCsvService, PartDataService],
  exports: [PartsService, PartDataService, CatalogueSearchService, MeasurementsService, DocumentsService, SourcingService],
})
export class PartsModule {}
