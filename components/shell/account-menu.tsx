'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useEffect, useRef, useState } from 'react';
import { signOutAction } from '@/app/(app)/actions';

export function AccountMenu({ name, email }: { name: string; email: string }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const menuRef = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (!open) return;
    const close = (event: MouseEvent | KeyboardEvent) => {
      if (event instanceof KeyboardEvent ? event.key === 'Escape' : !menuRef.current?.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener('mousedown', close);
    document.addEventListener('keydown', close);
    return () => { document.removeEventListener('mousedown', close); document.removeEventListener('keydown', close); };
  }, [open]);

  async function signOut() {
    await signOutAction();
    router.replace('/sign-in');
    router.refresh();
  }

  return (
    <div className="relative" ref={menuRef}>
      <button type="button" className="btn-quiet" aria-haspopup="menu" aria-expanded={open} onClick={() => setOpen((value) => !value)}>
        <span aria-hidden="true" className="flex h-5 w-5 items-center justify-center rounded-full bg-graphite text-[10px] text-paper">
          {name.split(/\s+/).map((part) => part[0]).join('').slice(0, 2).toUpperCase()}
        </span>
        <span className="max-w-40 truncate">{name}</span>
      </button>
      {open && (
        <div role="menu" aria-label="Account" className="panel absolute right-0 z-40 mt-1 w-60 py-1 text-sm">
          <p className="truncate px-3 py-2 text-xs text-graphite-500">{email}</p>
          <Link role="menuitem" href="/account" className="block px-3 py-2 hover:bg-paper-sunk focus:bg-paper-sunk" onClick={() => setOpen(false)}>
            Account
          </Link>
          <Link role="menuitem" href="/account/api" className="block px-3 py-2 hover:bg-paper-sunk focus:bg-paper-sunk" onClick={() => setOpen(false)}>
            API reference
          </Link>
          <button role="menuitem" type="button" className="block w-full px-3 py-2 text-left hover:bg-paper-sunk focus:bg-paper-sunk" onClick={signOut}>
            Sign out
          </button>
        </div>
      )}
    </div>
  );
}
