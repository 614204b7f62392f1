import { publicPhotoHref } from "../api/get-public-proposal";
import type { PublicProposal } from "../api/types";

/** The photos the proposal includes: small lazy thumbnails, each opening the full photo. */
export function PhotoGallery({ token, photos }: { token: string; photos: PublicProposal["photos"] }) {
  return (
    <ul className="grid grid-cols-1 gap-4 sm:grid-cols-2">
      {photos.map((photo, i) => {
        const label = photo.caption ?? `Photo ${i + 1}`;
        return (
          <li key={photo.id}>
            <figure className="overflow-hidden rounded-lg border border-ink-200 bg-white">
              <a href={publicPhotoHref(token, photo.id)} target="_blank" rel="noopener" className="block" aria-label={`${label} — open the full photo`}>
                <img
                  src={publicPhotoHref(token, photo.id, true)}
                  // The link's label names the photo; the caption below is read once.
                  alt=""
                  loading="lazy"
                  decoding="async"
                  width={480}
                  height={320}
                  className="aspect-[3/2] h-auto w-full bg-ink-100 object-cover"
                />
              </a>
              {photo.caption ? <figcaption className="px-3 py-2 text-base text-ink-800">{photo.caption}</figcaption> : null}
            </figure>
          </li>
        );
      })}
    </ul>
  );
}
