export const ROOM_USES = ["music", "speech", "teaching", "sport", "office", "dining", "other"] as const;
export type RoomUse = (typeof ROOM_USES)[number];

export const ROOM_USE_WORDS: Record<RoomUse, string> = {
  music: "Music",
  speech: "Speech and lectures",
  teaching: "Teaching and communication",
  sport: "Sport",
  office: "Office",
  dining: "Dining and café",
  other: "Other",
};
