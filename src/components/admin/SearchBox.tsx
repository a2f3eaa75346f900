import { type SyntheticEvent, useState } from 'react';

interface SearchBoxProps {
  id: string;
  label: string;
  placeholder: string;
  onSearch(text: string): void;
}

/** A search field with its button; searches on submit, not on every key. */
export default function SearchBox({ id, label, placeholder, onSearch }: SearchBoxProps) {
  const [text, setText] = useState('');
  function submit(event: SyntheticEvent) {
    event.preventDefault();
    onSearch(text.trim());
  }
  return (
    <search>
      <form onSubmit={submit} className="flex flex-wrap items-end gap-2 px-4 py-3">
        <div className="min-w-56 flex-1">
          <label htmlFor={id} className="field-label">
            {label}
          </label>
          <input
            id={id}
            type="search"
            className="field-input"
            placeholder={placeholder}
            value={text}
            onChange={(e) => setText(e.target.value)}
          />
        </div>
        <button type="submit" className="btn-primary">
          Search
        </button>
      </form>
    </search>
  );
}
