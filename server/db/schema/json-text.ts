import { customType } from "drizzle-orm/mysql-core";

// MariaDB's JSON is LONGTEXT underneath and mysql2 hands it back as a string, so parse on read.
export const jsonText = <T>(name: string) =>
  customType<{ data: T; driverData: string }>({
    dataType: () => "json",
    toDriver: (value) => JSON.stringify(value),
    fromDriver: (value) => (typeof value === "string" ? JSON.parse(value) : value) as T,
  })(name);
