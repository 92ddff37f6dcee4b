// npm run seed — seed the database named by DATABASE_URL with the demo scenario.
import { seedDemo } from "./index";

const url = process.env.DATABASE_URL;
if (!url) {
  console.error("Set DATABASE_URL, or use `npm start`, which seeds the embedded database itself.");
  process.exit(1);
}
await seedDemo(url);
