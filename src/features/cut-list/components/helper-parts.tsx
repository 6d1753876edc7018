import { useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import type { CreatePieceInput } from '@shared/schemas/piece';
import { useCreatePiece } from '../api/piece-mutations';
import { useCutList } from './cut-list-context';
import { saveErrorText } from './editable-cell';
import { LengthPreview } from './length-text';

/** A helper's length input with how it was read beside it. */
export function HelperLength({
  label,
  value,
  onChange,
  error,
  hint,
  placeholder,
}: {
  label: string;
  value: string;
  onChange: (v: string) => void;
  error?: string;
  hint?: ReactNode;
  placeholder?: string;
}) {
  return (
    <div>
      <TextField
        label={label}
        value={value}
        placeholder={placeholder}
        onChange={(e) => onChange(e.target.value)}
        error={error}
        hint={!value && !error ? hint : undefined}
      />
      {!error && <LengthPreview text={value} />}
    </div>
  );
}

/** The helper's working, line by line, so the crafter can check the arithmetic. */
export function Working({ lines, result }: { lines: string[]; result: ReactNode }) {
  return (
    <div className="rounded-md border border-line bg-paper p-3">
      <p className="text-xs font-medium uppercase tracking-wide text-pencil">Working</p>
      <ol className="mt-1 list-decimal space-y-1 pl-5 text-sm">
        {lines.map((l, i) => (
          <li key={i}>{l}</li>
        ))}
      </ol>
      <hr className="score-rule my-3" />
      <div className="text-base">{result}</div>
    </div>
  );
}

/** Name and material for the piece a helper makes, and the button that adds it. */
export function AddAsPiece({
  defaultName,
  piece,
  extra,
  disabled,
}: {
  defaultName: string;
  piece: (name: string, material: string) => CreatePieceInput | string;
  extra?: ReactNode;
  disabled?: boolean;
}) {
  const { tutorialId, canEdit } = useCutList();
  const create = useCreatePiece(tutorialId);
  const [name, setName] = useState(defaultName);
  const [material, setMaterial] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [added, setAdded] = useState<string | null>(null);
  if (!canEdit) return null;
  const add = async () => {
    setError(null);
    setAdded(null);
    const p = piece(name.trim(), material.trim());
    if (typeof p === 'string') return setError(p);
    try {
      const made = await create.mutateAsync(p);
      setAdded(`Added “${made.name}” to the cut list.`);
    } catch (e) {
      setError(saveErrorText(e));
    }
  };
  return (
    <div className="mt-3 flex flex-wrap items-start gap-3">
      {extra}
      <TextField label="Piece name" value={name} onChange={(e) => setName(e.target.value)} />
      <TextField label="Material" value={material} placeholder="optional" onChange={(e) => setMaterial(e.target.value)} />
      <Button className="mt-6" busy={create.isPending} disabled={disabled} onClick={() => void add()}>
        Add as piece
      </Button>
      {error && (
        <p role="alert" className="w-full text-sm text-rosehip">
          {error}
        </p>
      )}
      {added && (
        <p role="status" className="w-full text-sm text-sage">
          {added}
        </p>
      )}
    </div>
  );
}
