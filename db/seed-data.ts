// The invented demo world. No real people, firms, addresses or products.
import type { Role } from "./schema";

export interface DemoAccount {
  role: Role;
  email: string;
  password: string;
  name: string;
}

export const DEMO_FIRM = { name: "Larchmere Room Acoustics", contactEmail: "studio@larchmere.example" } as const;

export const DEMO_ACCOUNTS: DemoAccount[] = [
  { role: "owner", email: "owner@larchmere.example", password: "demo-owner-pass", name: "Ines Marlowe" },
  { role: "engineer", email: "engineer@larchmere.example", password: "demo-engineer-pass", name: "Tomas Okafor" },
  { role: "builder", email: "builder@larchmere.example", password: "demo-builder-pass", name: "Rafe Lindqvist" },
  { role: "client", email: "client@larchmere.example", password: "demo-client-pass", name: "Priya Hollis" },
  { role: "client", email: "client2@larchmere.example", password: "demo-client2-pass", name: "Jonah Vale" },
];

export interface DemoRoom {
  name: string;
  lengthM: number;
  widthM: number;
  heightM: number;
  temperatureC: number;
  humidityPct: number;
  notes: string;
}

export interface DemoProject {
  name: string;
  clientEmail: string;
  clientName: string;
  siteAddress: string;
  status: "survey" | "design" | "build" | "delivered" | "closed";
  notes: string;
  builderAssigned: boolean;
  rooms: DemoRoom[];
}

export const DEMO_PROJECTS: DemoProject[] = [
  {
    name: "Hollis media room",
    clientEmail: "client@larchmere.example",
    clientName: "Priya Hollis",
    siteAddress: "14 Alder Row, Westbrook Vale",
    status: "design",
    notes: "Basement media room, two rows of seats. The client accepts up to 30 cm of depth on the rear wall.",
    builderAssigned: true,
    rooms: [
      { name: "Media room", lengthM: 5.8, widthM: 4.1, heightM: 2.5, temperatureC: 20, humidityPct: 45, notes: "Drywall on studs, carpet on pad, one door at the rear left." },
    ],
  },
  {
    name: "Vale home studio",
    clientEmail: "client2@larchmere.example",
    clientName: "Jonah Vale",
    siteAddress: "3 Quarry Lane, Upper Fenwick",
    status: "survey",
    notes: "Converted garage: mixing room and a small vocal booth.",
    builderAssigned: false,
    rooms: [
      { name: "Mix room", lengthM: 4.6, widthM: 3.6, heightM: 2.6, temperatureC: 21, humidityPct: 50, notes: "Concrete floor, plasterboard walls." },
      { name: "Vocal booth", lengthM: 2.1, widthM: 1.8, heightM: 2.4, temperatureC: 21, humidityPct: 50, notes: "" },
    ],
  },
];
