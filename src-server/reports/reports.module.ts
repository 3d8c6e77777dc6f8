import { Module } from '@nestjs/common';
import { CompatibilityModule } from '../compatibility/compatibility.module';
import { ProductsModule } from '../products/products.module';
import { ReportsController } from './reports.controller';
import { ReportsService } from './reports.service';

/** Documents generated from a product's evaluation: the PDF report. */
@Module({
  imports: [CompatibilityModule, ProductsModule],
  controllers: [ReportsController],
  providers: [ReportsService],
})
export class ReportsModule {}
