import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../common/auth.decorators';
import { DomainError } from '../common/domain-error';
import { ALL_ROLES } from '../common/roles';
import { ParseIdPipe } from '../common/parse-id.pipe';
import { ProductsService } from './products.service';
import { CreateProductDto, ProductDetailDto, ProductListQueryDto, ProductSummaryDto, UpdateProductDto, VersionQueryDto } from './dto/product.dto';
import { CreateRadioDto, RadioDto, UpdateRadioDto } from './dto/radio.dto';
import { AuditPageDto } from '../audit/dto/audit-page.dto';

@ApiTags('products')
@Controller('products')
export class ProductsController {
  constructor(private readonly products: ProductsService) {}

  @Get()
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'All products; ?deleted=true lists the deleted ones instead (admin)' })
  @ApiOkResponse({ type: [ProductSummaryDto] })
  list(@Query() query: ProductListQueryDto, @CurrentUser() actor: AuthUser): Promise<ProductSummaryDto[]> {
    if (query.deleted && actor.role !== 'admin') throw new DomainError('FORBIDDEN_ROLE', 'Only admins see deleted products', 403);
    return this.products.list({ deleted: query.deleted });
  }

  @Post()
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Create a product (engineer, admin)' })
  @ApiCreatedResponse({ type: ProductDetailDto })
  create(@Body() body: CreateProductDto, @CurrentUser() actor: AuthUser): Promise<ProductDetailDto> {
    return this.products.create(body, actor);
  }

  @Get(':id')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'One product with its radios and their bands' })
  @ApiOkResponse({ type: ProductDetailDto })
  get(@Param('id', ParseIdPipe) id: number): Promise<ProductDetailDto> {
    return this.products.getWithRadios(id);
  }

  @Patch(':id')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Edit a product; send the version you edited (engineer, admin)' })
  @ApiOkResponse({ type: ProductDetailDto })
  update(@Param('id', ParseIdPipe) id: number, @Body() body: UpdateProductDto, @CurrentUser() actor: AuthUser): Promise<ProductDetailDto> {
    return this.products.update(id, body, actor);
  }

  @Delete(':id')
  @Roles('engineer', 'admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a product with its radios; an admin can restore it. Only its creator or an admin (403 PRODUCT_DELETE_FORBIDDEN)' })
  @ApiNoContentResponse()
  remove(@Param('id', ParseIdPipe) id: number, @Query() query: VersionQueryDto, @CurrentUser() actor: AuthUser): Promise<void> {
    return this.products.remove(id, query.version, actor);
  }

  @Post(':id/restore')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Undo the delete of a product; its radios and part assignments come back with it (admin)' })
  @ApiOkResponse({ type: ProductDetailDto })
  restore(@Param('id', ParseIdPipe) id: number, @CurrentUser() actor: AuthUser): Promise<ProductDetailDto> {
    return this.products.restore(id, actor);
  }

  @Get(':id/history')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'Every change to the product and its radios, newest first (admins: also of a deleted product)' })
  @ApiOkResponse({ type: AuditPageDto })
  history(@Param('id', ParseIdPipe) id: number, @CurrentUser() actor: AuthUser): Promise<AuditPageDto> {
    return this.products.history(id, actor);
  }

  @Get(':id/radios')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'The radios of a product' })
  @ApiOkResponse({ type: [RadioDto] })
  listRadios(@Param('id', ParseIdPipe) id: number): Promise<RadioDto[]> {
    return this.products.listRadios(id);
  }

  @Post(':id/radios')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Add a radio to a product (engineer, admin)' })
  @ApiCreatedResponse({ type: RadioDto })
  createRadio(@Param('id', ParseIdPipe) id: number, @Body() body: CreateRadioDto, @CurrentUser() actor: AuthUser): Promise<RadioDto> {
    return this.products.createRadio(id, body, actor);
  }

  @Get(':id/radios/:radioId')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'One radio of a product' })
  @ApiOkResponse({ type: RadioDto })
  getRadio(@Param('id', ParseIdPipe) id: number, @Param('radioId', ParseIdPipe) radioId: number): Promise<RadioDto> {
    return this.products.getRadio(id, radioId);
  }

  @Patch(':id/radios/:radioId')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Edit a radio; given bands replace the old list; send the version you edited (engineer, admin)' })
  @ApiOkResponse({ type: RadioDto })
  updateRadio(
    @Param('id', ParseIdPipe) id: number,
    @Param('radioId', ParseIdPipe) radioId: number,
    @Body() body: UpdateRadioDto,
    @CurrentUser() actor: AuthUser,
  ): Promise<RadioDto> {
    return this.products.updateRadio(id, radioId, body, actor);
  }

  @Delete(':id/radios/:radioId')
  @Roles('engineer', 'admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Remove a radio from a product (engineer, admin)' })
  @ApiNoContentResponse()
  removeRadio(
    @Param('id', ParseIdPipe) id: number,
    @Param('radioId', ParseIdPipe) radioId: number,
    @Query() query: VersionQueryDto,
    @CurrentUser() actor: AuthUser,
  ): Promise<void> {
    return this.products.removeRadio(id, radioId, query.version, actor);
  }
}
