import { Module } from '@nestjs/common';
import { RfToolsController } from './rf-tools.controller';
import { RfToolsService } from './rf-tools.service';

/** HTTP face of the pure RF module (src-server/rf): nothing here is stored. */
@Module({
  controllers: [RfToolsController],
  providers: [RfToolsService],
})
export class RfToolsModule {}
