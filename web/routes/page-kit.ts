import type { Context } from 'hono';
import { getCookie } from 'hono/cookie';
import { html } from 'hono/html';
import type { Child } from 'hono/jsx';
import type { ContentfulStatusCode } from 'hono/utils/http-status';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { ServiceContext } from '../../api/operations/service-context.ts';
import { ResultsCache, type StudyData } from '../data/study-data.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import type { TextBundles } from '../text/text-bundles.ts';
import {
  DEFAULT_LANGUAGE,
  translator,
  type LanguageCode,
  type Translator,
} from '../text/translator.ts';

/**
 * The language of a request: `?lang=` for this request, else the cookie the language switch
 * sets (LANGUAGE_COOKIE, a year), else English.
 */
export const LANGUAGE_COOKIE = 'tremora_lang';

export function languageOf(c: Context, bundles: TextBundles): LanguageCode {
  const asked = c.req.query('lang');
  if (bundles.has(asked)) return asked;
  const saved = getCookie(c, LANGUAGE_COOKIE);
  return bundles.has(saved) ? saved : DEFAULT_LANGUAGE;
}

/** What every page route works with. */
export interface PageKit {
  readonly ctx: ServiceContext;
  readonly results: ResultsCache;
  /** The text bundles the pages speak (read at start-up, read again after an import). */
  bundles: TextBundles;
  tr(c: Context): Translator;
  /** This request's path and query without `lang` (where the language switch returns). */
  here(c: Context): string;
  /** The reader's language, this page's path and the tool's version, as every view takes them. */
  page(c: Context): PageContext;
  render(c: Context, page: Child, status?: ContentfulStatusCode): Response | Promise<Response>;
}

export function pageKit(ctx: ServiceContext, bundles: TextBundles): PageKit {
  const tr = (c: Context): Translator => translator(languageOf(c, kit.bundles), kit.bundles);
  const here = (c: Context): string => {
    const url = new URL(c.req.url);
    url.searchParams.delete('lang');
    return `${url.pathname}${url.search}`;
  };
  const kit: PageKit = {
    ctx,
    results: new ResultsCache(),
    bundles,
    tr,
    here,
    page: (c) => ({ tr: tr(c), path: here(c), toolVersion: ctx.toolVersion }),
    render: (c, page, status = 200) => c.html(html`<!DOCTYPE html>${page}`, status),
  };
  return kit;
}

/** Stands for this origin while a path is resolved as a browser would (a reserved name, RFC 2606). */
const THIS_ORIGIN = 'http://this-origin.invalid';

/**
 * A same-origin path to return to, else "/". Browsers drop tabs and line breaks from a URL and
 * read "\\" as "/" (WHATWG URL standard), so "/<tab>/other.example" would lead to another
 * host: any control character or backslash is refused, then the path is resolved as a browser
 * would and kept only if it stays on this origin. It comes back percent-encoded, so it is
 * always a valid Location header.
 */
export function safeBackPath(back: string | undefined): string {
  // Control characters are exactly what this refuses (a browser drops tabs and newlines from a URL).
  // eslint-disable-next-line no-control-regex
  if (back === undefined || !back.startsWith('/') || /[\u0000-\u001f\u007f\\]/.test(back))
    return '/';
  let url: URL;
  try {
    url = new URL(back, THIS_ORIGIN);
  } catch {
    return '/';
  }
  const path = `${url.pathname}${url.search}${url.hash}`;
  return url.origin !== THIS_ORIGIN || path.startsWith('//') ? '/' : path;
}

/** A form field as text (multipart or urlencoded); files and absent fields are undefined. */
export function field(
  form: Record<string, string | File | (string | File)[]>,
  name: string,
): string | undefined {
  const value = form[name];
  return typeof value === 'string' ? value : undefined;
}

/** A form's file field, when a non-empty file was sent. */
export function fileField(
  form: Record<string, string | File | (string | File)[]>,
  name: string,
): File | undefined {
  const value = form[name];
  return value instanceof File && value.size > 0 ? value : undefined;
}

/**
 * The file a form sends: chosen in its `file` field, or carried back from an earlier answer as
 * `fileName` and `fileData` (base64) so that a choice form need not ask for it again.
 */
export async function uploadedOrCarried(
  form: Record<string, string | File | (string | File)[]>,
): Promise<{ bytes: Uint8Array; name: string; chosen: boolean } | undefined> {
  const file = fileField(form, 'file');
  if (file)
    return { bytes: new Uint8Array(await file.arrayBuffer()), name: file.name, chosen: true };
  const carried = field(form, 'fileData');
  const carriedName = field(form, 'fileName');
  return carried && carriedName
    ? { bytes: new Uint8Array(Buffer.from(carried, 'base64')), name: carriedName, chosen: false }
    : undefined;
}

/**
 * A form's issues split for its view: under each field the form shows (`fieldOf` names it, or
 * gives undefined for an issue of no shown field), and the others, listed above the form.
 */
export function issuesByField(
  issues: readonly InputIssue[],
  fieldOf: (path: string) => string | undefined,
): { byField: Map<string, InputIssue[]>; others: InputIssue[] } {
  const byField = new Map<string, InputIssue[]>();
  const others: InputIssue[] = [];
  for (const issue of issues) {
    const name = fieldOf(issue.path);
    if (name) byField.set(name, [...(byField.get(name) ?? []), issue]);
    else others.push(issue);
  }
  return { byField, others };
}

/**
 * What an editor form's view (a community's, a source's) is given besides its values: the study,
 * where the form posts (the item's own path when it is edited, else the path that adds one), and
 * its issues split by issuesByField.
 */
export function editorFormProps(
  kit: PageKit,
  c: Context,
  data: StudyData & { ok: true },
  form: {
    /** The item edited (none for a new one). */
    readonly existing: { readonly id: string; readonly name: string } | undefined;
    /** The editor's folder for these items (`communities`) and its path for a new one. */
    readonly folder: string;
    readonly newPath: string;
    readonly issues: ReturnType<typeof issuesByField>;
  },
) {
  const base = `/studies/${data.record.id}/edit`;
  return {
    page: kit.page(c),
    studyId: data.record.id,
    studyName: data.study.name,
    action: form.existing
      ? `${base}/${form.folder}/${encodeURIComponent(form.existing.id)}`
      : `${base}/${form.newPath}`,
    editing: form.existing?.name,
    fieldIssues: form.issues.byField,
    otherIssues: form.issues.others,
  };
}
