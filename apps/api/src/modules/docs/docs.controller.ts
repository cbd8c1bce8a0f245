import { Controller, Get, Header } from '@nestjs/common';
import { Public } from '../../common/auth/access.decorators.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { DocsService } from './docs.service.js';

export const SWAGGER_ASSETS_PATH = '/api/docs/assets';

const page = `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<title>Limitbook API</title>
<link rel="stylesheet" href="${SWAGGER_ASSETS_PATH}/swagger-ui.css">
</head>
<body>
<div id="api-docs"></div>
<script src="${SWAGGER_ASSETS_PATH}/swagger-ui-bundle.js"></script>
<script src="/api/docs/init.js"></script>
</body>
</html>
`;

// A separate script rather than an inline one, so a strict Content-Security-Policy can stay on.
const init = `window.ui = SwaggerUIBundle({ url: '/api/openapi.json', dom_id: '#api-docs', deepLinking: true, persistAuthorization: false });\n`;

@Controller()
@Public()
export class DocsController {
  constructor(private readonly docs: DocsService) {}

  @Get('openapi.json')
  @ApiContract({ summary: 'This OpenAPI document', tag: 'Docs', contentType: 'application/json' })
  openApi() {
    return this.docs.openApi();
  }

  @Get('docs')
  @Header('Content-Type', 'text/html; charset=utf-8')
  @ApiContract({ summary: 'Browsable API reference', tag: 'Docs', contentType: 'text/html' })
  page() {
    return page;
  }

  @Get('docs/init.js')
  @Header('Content-Type', 'text/javascript; charset=utf-8')
  @ApiContract({ summary: 'Start-up script of the API reference page', tag: 'Docs', contentType: 'text/javascript' })
  initScript() {
    return init;
  }
}
