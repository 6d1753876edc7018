import { Node } from '@tiptap/core';
import { newStepId } from './step-ids';
import type { StepAttrs } from './types';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    step: {
      /** Inserts a step with a title and an empty paragraph for its text. */
      insertStep: (options?: Partial<StepAttrs> & { title?: string }) => ReturnType;
    };
  }
}

// What a step may hold after its title: no headings (the title is the step's heading)
// and no nested steps or live lists.
export const STEP_BODY = '(paragraph | bulletList | orderedList | blockquote | still | callout)*';

const ID = /^[A-Za-z0-9_-]{1,64}$/;

/** The step's title: plain text, shown as the step's heading. */
export const StepTitle = Node.create({
  name: 'stepTitle',
  content: 'text*',
  marks: '',
  defining: true,
  parseHTML() {
    // Above the heading rule (priority 50) so our own h3 keeps being a step title.
    return [{ tag: 'h3[data-type="step-title"]', priority: 60 }];
  },
  renderHTML() {
    return ['h3', { 'data-type': 'step-title' }, 0];
  },
});

/** One numbered step: a title, its text and photos, and its time in the video. */
export const Step = Node.create({
  name: 'step',
  group: 'section',
  content: `stepTitle ${STEP_BODY}`,
  defining: true,
  isolating: true,
  addAttributes() {
    return {
      // A stable id, so comments can point at a step wherever it moves (see step-ids.ts).
      id: {
        default: null,
        parseHTML: (el: HTMLElement) => {
          const v = el.getAttribute('data-step-id');
          return v !== null && ID.test(v) ? v : null;
        },
        renderHTML: (attrs: Record<string, unknown>) => (typeof attrs.id === 'string' ? { 'data-step-id': attrs.id } : {}),
      },
      atMs: {
        default: null,
        parseHTML: (el: HTMLElement) => {
          const v = el.getAttribute('data-at-ms');
          return v !== null && /^\d{1,10}$/.test(v) ? Number(v) : null;
        },
        renderHTML: (attrs: Record<string, unknown>) => (typeof attrs.atMs === 'number' ? { 'data-at-ms': String(attrs.atMs) } : {}),
      },
      chapterId: {
        default: null,
        parseHTML: (el: HTMLElement) => {
          const v = el.getAttribute('data-chapter-id');
          return v !== null && ID.test(v) ? v : null;
        },
        renderHTML: (attrs: Record<string, unknown>) => (typeof attrs.chapterId === 'string' ? { 'data-chapter-id': attrs.chapterId } : {}),
      },
    };
  },
  parseHTML() {
    return [{ tag: 'section[data-type="step"]' }];
  },
  renderHTML({ HTMLAttributes }) {
    return ['section', { ...HTMLAttributes, 'data-type': 'step' }, 0];
  },
  addCommands() {
    return {
      insertStep:
        (options = {}) =>
        ({ commands }) => {
          const { title, atMs = null, chapterId = null, id = newStepId() } = options;
          return commands.insertContent({
            type: this.name,
            attrs: { id, atMs, chapterId },
            content: [{ type: 'stepTitle', content: title ? [{ type: 'text', text: title }] : [] }, { type: 'paragraph' }],
          });
        },
    };
  },
});
