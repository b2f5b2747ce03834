import { describe, expect, it } from 'vitest';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { createClientShell, fillShell, inlineStyles, preloadFonts, scriptsAfterFonts, stylesFirst } from '../../server/lib/client-shell';
import { PAGE_STATE_ID } from '../../shared/page-render';

const BUILT = `<!doctype html>
<html lang="en">
  <head>
    <meta charset="UTF-8" />
    <meta name="viewport" content="width=device-width, initial-scale=1" />
    <title>Hearthswap</title>
    <script type="module" crossorigin src="/assets/index-A1.js"></script>
    <link rel="modulepreload" crossorigin href="/assets/page-state-B2.js">
    <link rel="stylesheet" crossorigin href="/assets/index-C3.css">
  </head>
  <body>
    <div id="root"></div>
  </body>
</html>`;

describe('the page shell', () => {
  it('puts the style sheets ahead of every script in the head', () => {
    const html = stylesFirst(BUILT);
    const sheet = html.indexOf('<link rel="stylesheet" crossorigin href="/assets/index-C3.css">');
    expect(sheet).toBeGreaterThan(html.indexOf('<meta charset="UTF-8" />'));
    expect(sheet).toBeLessThan(html.indexOf('<script type="module"'));
    expect(sheet).toBeLessThan(html.indexOf('modulepreload'));
    expect(html.match(/rel="stylesheet"/g)).toHaveLength(1);
  });

  it('writes the entry’s style sheet into the head, ahead of the scripts, and leaves a sheet it cannot find as a link', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'client-shell-'));
    mkdirSync(path.join(dir, 'assets'));
    writeFileSync(path.join(dir, 'assets', 'index-C3.css'), 'body{color:red}');
    const html = inlineStyles(stylesFirst(BUILT), dir);
    expect(html).toContain('<style>body{color:red}</style>');
    expect(html).not.toContain('index-C3.css');
    expect(html.indexOf('<style>')).toBeLessThan(html.indexOf('<script type="module"'));
    const missing = inlineStyles(BUILT, mkdtempSync(path.join(tmpdir(), 'client-shell-')));
    expect(missing).toContain('<link rel="stylesheet" crossorigin href="/assets/index-C3.css">');
  });

  it('keeps a sheet that holds "</style" as a link (it would end the element early)', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'client-shell-'));
    mkdirSync(path.join(dir, 'assets'));
    writeFileSync(path.join(dir, 'assets', 'index-C3.css'), 'a::after{content:"</style>"}');
    expect(inlineStyles(BUILT, dir)).toContain('href="/assets/index-C3.css"');
  });

  it('preloads the woff2 face of each weight asked for, once, and no other', () => {
    const faces =
      '<meta charset="UTF-8" /><style>' +
      '@font-face{font-family:Nunito;font-weight:400;src:url(/assets/n-400-A.woff2)format("woff2"),url(/assets/n-400-A.woff)format("woff")}' +
      '@font-face{font-family:Nunito;font-weight:600;src:url(/assets/n-600-B.woff2)format("woff2")}' +
      '@font-face{font-family:Nunito;font-weight:800;src:url(/assets/n-800-C.woff2)format("woff2")}</style>';
    const html = preloadFonts(faces, [400, 800]);
    const links = html.match(/<link rel="preload" as="font" type="font\/woff2" crossorigin href="[^"]+">/g);
    expect(links).toEqual([
      '<link rel="preload" as="font" type="font/woff2" crossorigin href="/assets/n-400-A.woff2">',
      '<link rel="preload" as="font" type="font/woff2" crossorigin href="/assets/n-800-C.woff2">',
    ]);
    expect(html.indexOf('rel="preload"')).toBeLessThan(html.indexOf('<style>'));
    expect(preloadFonts(BUILT, [400])).toBe(BUILT);
  });

  it('preloads the faces each page’s first screen draws: the book’s semibold, the Kitchen’s extra-bold', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'client-shell-'));
    mkdirSync(path.join(dir, 'assets'));
    writeFileSync(path.join(dir, 'index.html'), BUILT);
    const face = (w: number) => `@font-face{font-family:Nunito;font-weight:${w};src:url(/assets/n-${w}.woff2)format("woff2")}`;
    writeFileSync(path.join(dir, 'assets', 'index-C3.css'), [400, 600, 700, 800, 900].map(face).join(''));
    const shell = createClientShell(dir);
    const preloaded = (p: string) => [...shell.html(p).matchAll(/rel="preload" as="font"[^>]*href="\/assets\/n-(\d+)\.woff2"/g)].map((m) => Number(m[1]));
    expect(preloaded('/recipes')).toEqual([400, 600, 700, 900]);
    expect(preloaded('/')).toEqual([400, 700, 800, 900]);
  });

  it('asks for the scripts at low priority, after the preloaded faces, and every one of them', () => {
    const html = scriptsAfterFonts(BUILT);
    expect(html).toContain('<script type="module" fetchpriority="low" crossorigin src="/assets/index-A1.js">');
    expect(html).toContain('<link rel="modulepreload" fetchpriority="low" crossorigin href="/assets/page-state-B2.js">');
    expect(html.match(/<script type="module"|<link rel="modulepreload"/g)).toHaveLength(2);
    expect(html.match(/fetchpriority="low"/g)).toHaveLength(2);
  });

  it('preloads a page’s own chunks once and never repeats the entry’s style sheet or scripts', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'client-shell-'));
    mkdirSync(path.join(dir, '.vite'));
    writeFileSync(path.join(dir, 'index.html'), BUILT);
    // as Vite writes it: a route chunk imports the entry (index.html), whose style sheet it then lists again
    const manifest = {
      'index.html': { file: 'assets/index-A1.js', isEntry: true, imports: ['_page-state.js'], css: ['assets/index-C3.css'] },
      '_page-state.js': { file: 'assets/page-state-B2.js' },
      'src/app/routes/kitchen.tsx': { file: 'assets/kitchen-D4.js', imports: ['index.html', '_page-state.js', '_card.js'] },
      '_card.js': { file: 'assets/card-E5.js', imports: ['index.html'] },
    };
    writeFileSync(path.join(dir, '.vite', 'manifest.json'), JSON.stringify(manifest));
    const shell = createClientShell(dir);
    const html = shell.html('/');
    expect(html.match(/rel="stylesheet"/g)).toHaveLength(1);
    expect(shell.preloads('/')).toEqual(['assets/kitchen-D4.js', 'assets/card-E5.js']);
    expect(html.match(/page-state-B2\.js/g)).toHaveLength(1);
    expect(html).toContain('<link rel="modulepreload" fetchpriority="low" crossorigin href="/assets/kitchen-D4.js">');
  });

  it('puts a drawn page in #root, its title in the head and its state in a JSON script', () => {
    const page = { html: '<title>Recipe book · Hearthswap</title><main><h1>Recipe book</h1></main>', state: '{"rendered":"recipe-book"}' };
    const html = fillShell(BUILT, page);
    expect(html).toContain('<title>Recipe book · Hearthswap</title>');
    expect(html).not.toContain('<title>Hearthswap</title>');
    expect(html.match(/<title>/g)).toHaveLength(1);
    expect(html).toContain(
      `<div id="root"><main><h1>Recipe book</h1></main></div><script type="application/json" id="${PAGE_STATE_ID}">{"rendered":"recipe-book"}</script>`,
    );
  });

  it('takes the page’s text as it is, "$&" and all (not a replacement pattern)', () => {
    const html = fillShell(BUILT, { html: '<h1>Cheap $&amp; cheerful $& $1</h1>', state: '{"title":"$\'"}' });
    expect(html).toContain('<div id="root"><h1>Cheap $&amp; cheerful $& $1</h1></div>');
    expect(html).toContain(`>{"title":"$'"}</script>`);
  });

  it('a page left to the browser still carries the state (the session), with #root empty', () => {
    const html = fillShell(BUILT, { html: null, state: '{"rendered":null}' });
    expect(html).toContain(`<div id="root"></div><script type="application/json" id="${PAGE_STATE_ID}">{"rendered":null}</script>`);
    expect(html).toContain('<title>Hearthswap</title>');
  });
});
