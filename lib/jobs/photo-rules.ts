/**
 * Photo limits in one place, used by the browser before sending (so an over-size photo never reaches the
 * server's body limit and replaces the page) and by the server, which checks again from the bytes.
 */
export const MAX_PHOTO_BYTES = 5 * 1024 * 1024;
export const MAX_PHOTOS_PER_UPLOAD = 6;

interface SizedFile {
  name: string;
  size: number;
}

/** One message per problem, in the words the form shows; empty when the files may be sent. */
export function photoSizeProblems(files: readonly SizedFile[]): string[] {
  const problems: string[] = [];
  if (files.length > MAX_PHOTOS_PER_UPLOAD) problems.push(`At most ${MAX_PHOTOS_PER_UPLOAD} photos at a time.`);
  for (const f of files) {
    if (f.size === 0) problems.push(`${f.name} is empty (0 bytes); choose the photo again.`);
    else if (f.size > MAX_PHOTO_BYTES) problems.push(`${f.name} is larger than 5 MB; take a smaller photo.`);
  }
  return problems;
}
