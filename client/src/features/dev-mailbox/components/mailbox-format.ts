const receivedFormat = new Intl.DateTimeFormat(undefined, {
  dateStyle: 'medium',
  timeStyle: 'medium',
});

/** When a message arrived, to the second: several often arrive in the same minute. */
export function formatReceived(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : receivedFormat.format(date);
}

/** A file size for people: "812 B", "14 KB", "1.2 MB". */
export function formatSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${Math.ceil(bytes / 1024)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}
