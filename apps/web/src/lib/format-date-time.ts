const pad = (value: number) => String(value).padStart(2, '0');

/** An ISO instant as local `YYYY-MM-DD HH:mm`: unambiguous in every lab's locale, and sortable by eye. */
export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return (
    `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())} ` +
    `${pad(date.getHours())}:${pad(date.getMinutes())}`
  );
}
