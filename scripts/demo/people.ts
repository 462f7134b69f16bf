import type { ShopUnits, UserRole } from "@/models";

// Invented shops and people for the demo. Phone numbers use the 555-01xx range reserved for
// fiction (common practice in North America); e-mail addresses use the reserved .test domain.

export const demoPassword = "chill-demo-2026";

export type DemoUser = { key: string; email: string; name: string; role: UserRole };
export type DemoShop = {
  key: string;
  name: string;
  units: ShopUnits;
  altitudeM: number;
  timeZone: string;
  locale: string;
  users: DemoUser[];
};

export const harbourline: DemoShop = {
  key: "harbourline",
  name: "Harbourline Auto Climate",
  units: "metric",
  altitudeM: 12,
  timeZone: "America/Halifax",
  locale: "en-CA",
  users: [
    { key: "owner", email: "owner@harbourline.test", name: "Maren Quist", role: "owner" },
    { key: "senior", email: "senior@harbourline.test", name: "Tobias Okonkwo-Reyes", role: "senior" },
    { key: "tech", email: "tech@harbourline.test", name: "Priya Lindqvist", role: "technician" },
    { key: "apprentice", email: "apprentice@harbourline.test", name: "Danny Ferreira", role: "apprentice" },
  ],
};

export const ridgeback: DemoShop = {
  key: "ridgeback",
  name: "Ridgeback Cooling Works",
  units: "imperial",
  altitudeM: 1500,
  timeZone: "America/Denver",
  locale: "en-US",
  users: [{ key: "owner", email: "owner@ridgeback.test", name: "Wendell Achterberg", role: "owner" }],
};

export const demoShops: DemoShop[] = [harbourline, ridgeback];

export type DemoCustomer = {
  key: string;
  shopKey: string;
  name: string;
  phone: string;
  email: string | null;
};

export const demoCustomers: DemoCustomer[] = [
  {
    key: "halvorsen",
    shopKey: "harbourline",
    name: "Ingrid Halvorsen",
    phone: "+1 902 555 0142",
    email: "ingrid.h@example.test",
  },
  { key: "mbeki", shopKey: "harbourline", name: "Sipho Mbeki-Grant", phone: "+1 902 555 0178", email: null },
  {
    key: "tidewater",
    shopKey: "harbourline",
    name: "Tidewater Courier Co-op",
    phone: "+1 902 555 0119",
    email: "fleet@tidewater-coop.test",
  },
  {
    key: "castellanos",
    shopKey: "harbourline",
    name: "Lucía Castellanos",
    phone: "+1 902 555 0163",
    email: "lucia.c@example.test",
  },
  {
    key: "brandvold",
    shopKey: "ridgeback",
    name: "Arne Brandvold",
    phone: "+1 303 555 0127",
    email: "arne.b@example.test",
  },
  {
    key: "okafor",
    shopKey: "harbourline",
    name: "Adaeze Okafor-Lindgren",
    phone: "+1 902 555 0191",
    email: "adaeze.ol@example.test",
  },
];
