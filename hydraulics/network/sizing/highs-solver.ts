import type { Highs } from 'highs';

let loading: Promise<Highs> | undefined;

/**
 * The HiGHS LP/MIP solver (WebAssembly, package `highs`), loaded once per process. Imported at run
 * time and hidden from bundlers: the core's barrel is also bundled for the browser, where the
 * sizing never runs and the package's Node-only loader must not be pulled in.
 */
export function loadHighs(): Promise<Highs> {
  loading ??= import(/* webpackIgnore: true */ /* turbopackIgnore: true */ 'highs').then(
    (module: { default: () => Promise<Highs> }) => module.default(),
  );
  return loading;
}
