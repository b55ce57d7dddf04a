/** Who made or decided something, as views name people. */
export interface PersonRef {
  id: number;
  name: string;
}
