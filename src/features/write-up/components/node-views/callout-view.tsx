import { NodeViewContent, NodeViewWrapper, type NodeViewProps } from '@tiptap/react';

const LABELS = { tip: 'Tip', caution: 'Caution' } as const;

/** A tip (sage) or a caution (rosehip), labelled in words so colour is never the only sign. */
export function CalloutView({ node }: NodeViewProps) {
  const kind = node.type.name === 'caution' ? 'caution' : 'tip';
  return (
    <NodeViewWrapper as="aside" className={`wu-callout wu-${kind}`} aria-label={LABELS[kind]}>
      <span className="wu-callout-label" contentEditable={false}>
        {kind === 'caution' ? '⚠ ' : '✎ '}
        {LABELS[kind]}
      </span>
      <NodeViewContent className="wu-callout-content" />
    </NodeViewWrapper>
  );
}
