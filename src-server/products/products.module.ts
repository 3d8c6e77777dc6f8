import { Module } from '@nestjs/common';
import { ProductsController } from './products.controller';
import { ProductsService } from './products.service';
import { InProductMeasurementsController } from './in-product/in-product-measurements.controller';
import { InProductMeasurementsService } from './in-product/in-product-measurements.service';

@Module({
  controllers: [ProductsController, InProductMeasurementsController],
  providers: [ProductsService, InProductMeasurementsService],
  exports: [ProductsService, InProductMeasurementsService],
})
export class ProductsModule {}
