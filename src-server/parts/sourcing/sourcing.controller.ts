import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Put } from '@nestjs/common';
import { ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ParseIdPipe } from '../../common/parse-id.pipe';
import { OFFER_UNDO_SECONDS, SourcingService } from './sourcing.service';
import { AlternateInputDto, CreateOfferDto, UpdateOfferDto } from '../dto/sourcing.dto';
import { OfferDto, OfferRemovalDto } from '../dto/part-response.dto';

@ApiTags('part sourcing')
@Controller('parts/:id')
export class SourcingController {
  constructor(private readonly sourcing: SourcingService) {}

  @Post('offers')
  @Roles('procurement', 'admin')
  @ApiOperation({ summary: 'Add a supplier offer (procurement, admin)' })
  @ApiCreatedResponse({ type: OfferDto })
  createOffer(@Param('id', ParseIdPipe) id: number, @Body() body: CreateOfferDto, @CurrentUser() user: AuthUser): Promise<OfferDto> {
    return this.sourcing.createOffer(id, body, user);
  }

  @Patch('offers/:offerId')
  @Roles('procurement', 'admin')
  @ApiOperation({ summary: 'Edit an offer; 409 OFFER_VERSION_CONFLICT on a stale version (procurement, admin)' })
  @ApiOkResponse({ type: OfferDto })
  updateOffer(
    @Param('id', ParseIdPipe) id: number,
    @Param('offerId', ParseIdPipe) offerId: number,
    @Body() body: UpdateOfferDto,
    @CurrentUser() user: AuthUser,
  ): Promise<OfferDto> {
    return this.sourcing.updateOffer(id, offerId, body, user);
  }

  @Delete('offers/:offerId')
  @Roles('procurement', 'admin')
  @HttpCode(204)
  @ApiOperation({ summary: `Remove an offer; it can be put back for ${OFFER_UNDO_SECONDS} s (procurement, admin)` })
  removeOffer(@Param('id', ParseIdPipe) id: number, @Param('offerId', ParseIdPipe) offerId: number, @CurrentUser() user: AuthUser): Promise<void> {
    return this.sourcing.removeOffer(id, offerId, user);
  }

  @Get('offer-removals')
  @Roles('procurement', 'admin')
  @ApiOperation({ summary: `Offers removed in the last ${OFFER_UNDO_SECONDS} s, which can still be put back (procurement, admin)` })
  @ApiOkResponse({ type: [OfferRemovalDto] })
  removals(@Param('id', ParseIdPipe) id: number): Promise<OfferRemovalDto[]> {
    return this.sourcing.recentRemovals(id);
  }

  @Post('offers/:offerId/restoration')
  @Roles('procurement', 'admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Undo the removal of an offer, under its id; 410 OFFER_UNDO_EXPIRED after the window (procurement, admin)' })
  @ApiOkResponse({ type: OfferDto })
  restoreOffer(@Param('id', ParseIdPipe) id: number, @Param('offerId', ParseIdPipe) offerId: number, @CurrentUser() user: AuthUser): Promise<OfferDto> {
    return this.sourcing.restoreOffer(id, offerId, user);
  }

  @Put('alternates/:otherId')
  @Roles('procurement', 'admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Link two parts as alternates or second sources, both ways (procurement, admin)' })
  link(
    @Param('id', ParseIdPipe) id: number,
    @Param('otherId', ParseIdPipe) otherId: number,
    @Body() body: AlternateInputDto,
    @CurrentUser() user: AuthUser,
  ): Promise<void> {
    return this.sourcing.link(id, otherId, body, user);
  }

  @Delete('alternates/:otherId')
  @Roles('procurement', 'admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Remove an alternate link, both ways (procurement, admin)' })
  unlink(@Param('id', ParseIdPipe) id: number, @Param('otherId', ParseIdPipe) otherId: number, @CurrentUser() user: AuthUser): Promise<void> {
    return this.sourcing.unlink(id, otherId, user);
  }
}
