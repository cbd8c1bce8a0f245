import { Controller, Get } from '@nestjs/common';
import { searchQuerySchema, searchResponseSchema, type SearchQuery } from '@limitbook/contracts';
import { AnySignedIn, Roles } from '../../common/auth/access.decorators.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidQuery } from '../../common/validation/valid.decorators.js';
import { SearchService } from './search.service.js';

@Controller('search')
export class SearchController {
  constructor(private readonly search: SearchService) {}

  @Get()
  @Roles(...AnySignedIn)
  @ApiContract({
    summary: 'Search published pages by words, phrases or document number; ranked, with plain-text snippets and highlight ranges',
    description:
      'Words go through PostgreSQL text search (English stemming; "quoted phrases" and -excluded words work). Document-number matches come first, then hits in a number or title, then by rank.',
    response: searchResponseSchema,
    tag: 'Library',
  })
  find(@ValidQuery(searchQuerySchema) query: SearchQuery) {
    return this.search.search(query);
  }
}
