// The application menu: file commands are forwarded to the renderer; undo/redo keys stay with the renderer.
import { describe, expect, it, vi } from 'vitest';

vi.mock('electron', () => ({ Menu: { setApplicationMenu: vi.fn(), buildFromTemplate: vi.fn() } }));
const { menuTemplate } = await import('../../src-main/electron/menu');

describe('application menu', () => {
  const send = vi.fn();
  const items = (recent: string[]) => menuTemplate({ recent, isMac: false, send, about: () => {} });
  const find = (menu: any[], label: string): any =>
    menu.flatMap((m) => [m, ...(Array.isArray(m.submenu) ? m.submenu : [])]).find((m) => m.label === label);

  it('forwards file commands and recent files to the renderer', () => {
    const menu = items(['/sites/a.gpsite']);
    find(menu, 'Save as…').click();
    expect(send).toHaveBeenLastCalledWith('saveAs');
    find(menu, 'Open recent').submenu[0].click();
    expect(send).toHaveBeenLastCalledWith('openRecent', '/sites/a.gpsite');
    expect(find(items([]), 'Open recent').submenu[0].enabled).toBe(false);
  });

  it('shows the undo and redo keys without taking them from the renderer', () => {
    const menu = items([]);
    for (const label of ['Undo change', 'Redo change']) expect(find(menu, label).registerAccelerator).toBe(false);
    expect(find(menu, 'Save').registerAccelerator).toBe(true);
  });
});
