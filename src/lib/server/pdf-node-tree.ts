// A react-pdf document's elements made straight into the node tree react-pdf lays out, without
// React's reconciler. A printed document is built once and never updated, so fibers, diffing and a
// root kept between documents bought nothing but a tenth of a sheet's time, and a root shared by
// every document needed guards (a failed part left the last document in place; moved keyed rows
// printed twice). The nodes are those react-pdf's own host config makes (createInstance,
// createTextInstance, appendChild), and the children are read as React reads them. Server only.
import type { ReactElement, ReactNode } from 'react';

/** A node of react-pdf's tree: a primitive (DOCUMENT, PAGE, VIEW, TEXT, SVG…) with its style, props and children. */
export interface PdfNode {
  type: string;
  box: Record<string, never>;
  style: unknown;
  props: Record<string, unknown>;
  children: (PdfNode | PdfTextNode)[];
}

/** A run of text inside a Text (or Link, Tspan, Note). */
export interface PdfTextNode {
  type: 'TEXT_INSTANCE';
  value: string;
}

const FRAGMENT = Symbol.for('react.fragment');
const ELEMENT = new Set([Symbol.for('react.transitional.element'), Symbol.for('react.element')]);
// react-pdf's appendChild drops text anywhere else, with a warning.
const TEXT_PARENTS = new Set(['TEXT', 'LINK', 'TSPAN', 'NOTE']);

function isElement(value: unknown): value is ReactElement<Record<string, unknown>> {
  return typeof value === 'object' && value !== null && ELEMENT.has((value as { $$typeof?: symbol }).$$typeof!);
}

function typeName(type: unknown): string {
  if (typeof type === 'function') return type.name || 'anonymous';
  return String((type as { $$typeof?: symbol } | null)?.$$typeof?.description ?? type);
}

// Appends what `child` renders to: elements, arrays and iterables, fragments, components' output.
function append(parent: PdfNode, child: ReactNode | unknown): void {
  // As React: nothing for null, undefined, booleans and ''; a text node for a string, number or bigint.
  if (child === null || child === undefined || child === '' || typeof child === 'boolean') return;
  if (typeof child === 'string' || typeof child === 'number' || typeof child === 'bigint') {
    const text = String(child);
    if (TEXT_PARENTS.has(parent.type)) parent.children.push({ type: 'TEXT_INSTANCE', value: text });
    else console.warn(`Invalid '${text}' string child outside <Text> component`);
    return;
  }
  if (Array.isArray(child)) {
    for (const c of child) append(parent, c);
    return;
  }
  if (!isElement(child)) {
    if (typeof child === 'object' && Symbol.iterator in child) {
      for (const c of child as Iterable<unknown>) append(parent, c);
      return;
    }
    throw new Error(`A PDF document cannot hold ${typeof child === 'object' ? 'a plain object' : typeof child} as a child.`);
  }
  const { type, props } = child;
  if ((type as unknown) === FRAGMENT) {
    append(parent, props.children);
    return;
  }
  if (typeof type === 'string') {
    parent.children.push(hostNode(type, props));
    return;
  }
  // Hooks, context, class components and the like need React's renderer; a document has no use for them.
  if (typeof type !== 'function' || (type as { prototype?: { isReactComponent?: unknown } }).prototype?.isReactComponent)
    throw new Error(`A PDF document's parts must be plain function components (found ${typeName(type)}).`);
  append(parent, (type as (p: unknown) => ReactNode)(props));
}

// As react-pdf's createInstance: the style apart, the children made into nodes, the rest as props.
function hostNode(type: string, { style, children, ...props }: Record<string, unknown>): PdfNode {
  for (const name of ['render', 'layout'] as const)
    if (typeof props[name] === 'function') throw new Error(`A PDF document's '${name}' function props are not supported (on ${type}).`);
  const node: PdfNode = { type, box: {}, style: style || {}, props, children: [] };
  append(node, children);
  return node;
}

/** The node tree react-pdf lays out for a document element (a `<Document>`, or a component that renders one). */
export function documentNode(element: ReactElement): PdfNode {
  const root: PdfNode = { type: 'ROOT', box: {}, style: {}, props: {}, children: [] };
  append(root, element);
  const [document, ...more] = root.children;
  if (!document || more.length > 0 || document.type !== 'DOCUMENT') throw new Error('A PDF must be one <Document>.');
  return document as PdfNode;
}
