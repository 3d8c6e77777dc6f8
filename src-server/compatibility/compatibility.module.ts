import { Module } from '@nestjs/common';
import { PartsModule } from '../parts/parts.module';
import { ProductsModule } from '../products/products.module';
import { RegulatoryModule } from '../regulatory/regulatory.module';
import { CompatibilityController } from './compatibility.controller';
import { CompatibilityService } from './compatibility.service';
import { RulesController } from './rules.controller';
import { RulesService } from './rules.service';

@Module({
  imports: [PartsModule, ProductsModule, RegulatoryModule],
  controllers: [RulesController, CompatibilityController],
  providers: [RulesService, CompatibilityService],
  exports: [RulesService, CompatibilityService],
})
export class CompatibilityModule {}
