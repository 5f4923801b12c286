// A yes/no question in a modal <dialog> (focus moves into it, Esc answers "no"), for the teaching pages' forms:
// deleting a class or lesson, and dates the server asks about. Text goes in as text, never as markup.
import { ui } from './styles.ts';

export interface Question {
  title: string;
  message: string;
  yes: string;
  no: string;
  /** A destructive yes is drawn in the warning colour. */
  destructive?: boolean;
}

/** Shows the question and resolves true for the yes button, false for the no button or Esc. */
export function ask(q: Question): Promise<boolean> {
  const dialog = document.createElement('dialog');
  dialog.className = 'm-auto w-[min(32rem,calc(100vw-2rem))] rounded-lg border border-muslin-300 bg-white p-6 text-indigo-ink shadow-lg backdrop:bg-indigo-ink/40';
  dialog.setAttribute('aria-labelledby', 'confirm-title');
  const h = document.createElement('h2');
  h.id = 'confirm-title';
  h.className = 'text-xl font-bold';
  h.textContent = q.title;
  const p = document.createElement('p');
  p.className = 'mt-3';
  p.dataset['confirmMessage'] = '';
  p.textContent = q.message;
  const row = document.createElement('div');
  row.className = 'mt-6 flex flex-wrap justify-end gap-3';
  const no = document.createElement('button');
  no.type = 'button';
  no.className = ui.quietButton;
  no.textContent = q.no;
  const yes = document.createElement('button');
  yes.type = 'button';
  yes.className = q.destructive ? ui.dangerButton : ui.button;
  yes.textContent = q.yes;
  row.append(no, yes);
  dialog.append(h, p, row);
  document.body.append(dialog);
  return new Promise((resolve) => {
    const done = (answer: boolean) => {
      dialog.close();
      dialog.remove();
      resolve(answer);
    };
    no.addEventListener('click', () => done(false));
    yes.addEventListener('click', () => done(true));
    dialog.addEventListener('cancel', (e) => {
      e.preventDefault();
      done(false);
    });
    dialog.showModal();
    no.focus();
  });
}
