/** Photos are reached only through the API, which checks the shop; never a public folder. */
export const photoUrls = (id: number) => ({ imageUrl: `/api/photos/${id}/image`, thumbUrl: `/api/photos/${id}/thumb` });
