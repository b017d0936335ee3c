import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import type { LoaderFunction } from 'react-router-dom';

/** A page module's loader, made with the one query client as every route module exports it. */
type LoaderFactory = (queryClient: QueryClient) => LoaderFunction;

/**
 * A route whose module is fetched the first time it is visited (React Router's `lazy`), so the
 * first page ships without every other page, the charts or other roles' screens. The module and
 * the loader it exports resolve before the page renders; the loader then starts its own reads.
 */
export const lazyPage =
  (queryClient: QueryClient) =>
  <M>(load: () => Promise<M>, pick: (module: M) => [ComponentType, LoaderFactory?]) =>
  async () => {
    const [Component, loader] = pick(await load());
    return loader ? { Component, loader: loader(queryClient) } : { Component };
  };

/**
 * A page whose loader is in the first file and only its component fetched on the first visit
 * (React Router's lazy object): the router calls the loader at once, so its reads run while the
 * module downloads, instead of after it (a lazy function must resolve before its loader exists).
 */
export const lazyComponent = <M>(load: () => Promise<M>, pick: (module: M) => ComponentType) => ({
  Component: async () => pick(await load()),
});
