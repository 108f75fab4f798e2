// The only file that loads the `highs` package at run time; others import its types.
// A namespace import: under NodeNext the package's CommonJS-flavoured types make a
// default import look like the namespace, while at run time `.default` is the loader.
import * as highsPackage from 'highs';
import type { Highs } from 'highs';

type HighsLoaderFunction = () => Promise<Highs>;

function packageLoader(): HighsLoaderFunction {
  const exported: unknown = highsPackage.default;
  if (typeof exported === 'function') return exported as HighsLoaderFunction;
  return (exported as { default: HighsLoaderFunction }).default;
}

let loading: Promise<Highs> | null = null;
let loadMilliseconds: number | null = null;

/**
 * The HiGHS WebAssembly module, loaded once per process (about 0.1 s; the
 * wasm is compiled lazily on the first solve). A failed load is not cached,
 * so a later call may try again.
 */
export function loadHighs(): Promise<Highs> {
  if (!loading) {
    const started = performance.now();
    loading = packageLoader()().then(
      (highs: Highs) => {
        loadMilliseconds = performance.now() - started;
        return highs;
      },
      (error: unknown) => {
        loading = null;
        throw new Error(`Could not load the HiGHS solver module: ${error instanceof Error ? error.message : String(error)}`);
      },
    );
  }
  return loading!;
}

/** How long the one load took, or null before it finished. */
export function highsLoadTimeMs(): number | null {
  return loadMilliseconds;
}
