import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

/** The frame of a live list: a title that says where the rows come from, and (for editors) a link to edit them there. */
export function LiveFrame({
  title,
  editTo,
  editLabel,
  controls,
  selected,
  editable,
  children,
}: {
  title: string;
  editTo: string;
  editLabel: string;
  controls?: ReactNode;
  selected: boolean;
  editable: boolean;
  children: ReactNode;
}) {
  return (
    <div className={`wu-live${selected ? ' is-selected' : ''}`} contentEditable={false}>
      <div className="wu-live-head">
        <span className="wu-live-title">{title}</span>
        <span className="wu-live-note">live: follows the {editLabel} section</span>
        <span className="ml-auto flex items-center gap-3">
          {controls}
          {editable && (
            <Link to={editTo} className="wu-live-edit">
              Edit in {editLabel}
            </Link>
          )}
        </span>
      </div>
      {children}
    </div>
  );
}
