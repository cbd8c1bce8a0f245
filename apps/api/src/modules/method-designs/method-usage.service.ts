import { Injectable } from '@nestjs/common';
import {
  isHouseMethodId,
  type LaggingBlock,
  type LaggingBlocks,
  type MethodCatalogDetail,
  type MoveBlocksForwardRequest,
  type MoveBlocksForwardResponse,
  type Page,
  type PageDocument,
} from '@limitbook/contracts';
import { type CalculatorBlockAttrs, listCalculatorBlocks, type LimitbookDocument } from '@limitbook/editor-schema';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { AppException } from '../../common/errors/app.exception.js';
import { seesDrafts, seesReviews } from '../library/library-access.js';
import { PagesService } from '../library/pages.service.js';
import { MethodsService } from '../methods/methods.service.js';
import { MethodDesignsRepository } from './method-designs.repository.js';

function blocksOf(document: unknown): CalculatorBlockAttrs[] {
  try {
    return listCalculatorBlocks(document as LimitbookDocument);
  } catch {
    // Bodies are validated on save; one that no longer parses has no usable blocks.
    return [];
  }
}

/**
 * Where methods are used: the pages whose calculator blocks name a method and the version they
 * pin, and blocks pinned to a version older than the latest release, which an editor can move
 * forward through the page's draft (and so through review).
 */
@Injectable()
export class MethodUsageService {
  constructor(
    private readonly repository: MethodDesignsRepository,
    private readonly methods: MethodsService,
    private readonly pages: PagesService,
  ) {}

  async catalogDetail(user: AuthUser, id: string): Promise<MethodCatalogDetail> {
    const house = isHouseMethodId(id);
    let tests: MethodCatalogDetail['tests'] = [];
    let latestVersion: number;
    if (house) {
      const found = await this.methods.houseMethod(id, null);
      latestVersion = found.version;
      tests = found.definition.tests;
    } else {
      latestVersion = (await this.methods.getMethod(id)).version;
    }
    const states = [...new Set(['released' as const, ...(seesDrafts(user.role) ? (['draft', 'in_review'] as const) : seesReviews(user.role) ? (['in_review'] as const) : [])])];
    const revisions = await this.repository.pageRevisionsMentioning(id, states);
    const usages = revisions.flatMap((revision) =>
      blocksOf(revision.document)
        .filter((block) => block.method === id)
        .map((block) => ({
          pageId: revision.pageId,
          documentNumber: revision.documentNumber,
          title: revision.title,
          revisionId: revision.revisionId,
          state: revision.state,
          revisionLetter: revision.revisionLetter,
          blockId: block.blockId,
          caption: block.caption,
          methodVersion: block.methodVersion,
        })),
    );
    return { id, source: house ? 'in-house' : 'built-in', latestVersion, usages, tests };
  }

  /** Editors read the page's draft when there is one, everyone else the released revision. */
  async lagging(user: AuthUser, pageId: string): Promise<LaggingBlocks> {
    const page = await this.currentPage(user, pageId);
    return { pageId: page.id, revisionId: page.revision.id, state: page.revision.state, items: await this.laggingIn(page.revision.document) };
  }

  async moveForward(actor: AuthUser, pageId: string, request: MoveBlocksForwardRequest): Promise<MoveBlocksForwardResponse> {
    let page = await this.currentPage(actor, pageId);
    if (page.draft && page.draft.state !== 'draft') {
      throw new AppException(409, 'CONFLICT', 'This page has a revision in review. Withdraw it to draft first, or wait for the reviewer.');
    }
    if (page.draft && request.baseVersion === undefined) {
      throw new AppException(409, 'CONFLICT', `This page has a draft at version ${page.draft.version}; send it as baseVersion to change it.`, {
        baseVersion: `The draft is at version ${page.draft.version}`,
      });
    }
    const lagging = new Map((await this.laggingIn(page.revision.document)).map((block) => [block.blockId, block]));
    const fields: Record<string, string> = {};
    request.blockIds.forEach((blockId, index) => {
      if (!lagging.has(blockId)) fields[`blockIds.${index}`] = 'Not a block of this page pinned to an older version';
    });
    if (Object.keys(fields).length > 0) throw new AppException(400, 'VALIDATION_FAILED', 'Some blocks cannot be moved forward.', fields);

    if (!page.draft) page = await this.pages.startDraft(actor, pageId);
    const chosen = new Set(request.blockIds);
    const moved: MoveBlocksForwardResponse['moved'] = [];
    const document = withBlocks(page.revision.document, (attrs) => {
      const block = lagging.get(String(attrs.blockId));
      if (!block || !chosen.has(block.blockId)) return attrs;
      moved.push({ blockId: block.blockId, from: block.pinnedVersion, to: block.latestVersion });
      return { ...attrs, methodVersion: block.latestVersion };
    });
    const saved = await this.pages.saveDraft(actor, pageId, { baseVersion: request.baseVersion ?? page.revision.version, title: page.revision.title, document });
    return { pageId: saved.id, revisionId: saved.revision.id, version: saved.revision.version, moved };
  }

  private async currentPage(user: AuthUser, pageId: string): Promise<Page> {
    const page = await this.pages.get(user, pageId, undefined);
    return page.draft && seesDrafts(user.role) ? this.pages.get(user, pageId, 'draft') : page;
  }

  private async laggingIn(document: unknown): Promise<LaggingBlock[]> {
    const latest = new Map<string, number | undefined>();
    const items: LaggingBlock[] = [];
    for (const block of blocksOf(document)) {
      if (block.methodVersion === null) continue;
      if (!latest.has(block.method)) latest.set(block.method, await this.methods.latestVersion(block.method));
      const latestVersion = latest.get(block.method);
      if (latestVersion !== undefined && block.methodVersion < latestVersion) {
        items.push({ blockId: block.blockId, caption: block.caption, method: block.method, pinnedVersion: block.methodVersion, latestVersion });
      }
    }
    return items;
  }
}

/** A copy of the document with each calculator block's attributes passed through `change`. */
function withBlocks(document: PageDocument, change: (attrs: Record<string, unknown>) => Record<string, unknown>): PageDocument {
  const visit = (node: unknown): unknown => {
    if (!node || typeof node !== 'object') return node;
    const shaped = node as { type?: string; attrs?: Record<string, unknown>; content?: unknown[] };
    return {
      ...shaped,
      ...(shaped.type === 'calculatorBlock' && shaped.attrs ? { attrs: change(shaped.attrs) } : {}),
      ...(Array.isArray(shaped.content) ? { content: shaped.content.map(visit) } : {}),
    };
  };
  return visit(document) as PageDocument;
}
