import * as accounts from "@/db/migrations/0001-accounts";
import * as catalogue from "@/db/migrations/0002-catalogue";
import * as community from "@/db/migrations/0003-community";
import * as importsAndLists from "@/db/migrations/0004-imports-and-lists";
import * as measuredListLines from "@/db/migrations/0005-measured-list-lines";
import * as oneApprovedCross from "@/db/migrations/0006-one-approved-cross";
import * as hashedSessions from "@/db/migrations/0007-hashed-sessions";
import * as serialsWordsAndOrders from "@/db/migrations/0008-serials-words-and-orders";
import * as nearNumberIndex from "@/db/migrations/0009-near-number-index";
import * as proposals from "@/db/migrations/0010-proposals";
import * as normalised from "@/db/migrations/0011-normalised";
import * as packingAndGaskets from "@/db/migrations/0012-packing-and-gaskets";
import * as smallParts from "@/db/migrations/0013-small-parts";
import * as catalogueVersion from "@/db/migrations/0014-catalogue-version";
import * as nearestSizeIndex from "@/db/migrations/0015-nearest-size-index";
import * as catalogueVersionNotice from "@/db/migrations/0016-catalogue-version-notice";
import * as numberVariants from "@/db/migrations/0017-number-variants";
import * as partSizes from "@/db/migrations/0018-part-sizes";
import * as variantKeys from "@/db/migrations/0019-variant-keys";

// Listed by hand, in order, so that the same list runs under tsx, vitest and the Next bundle alike.
export const migrations = [
  { name: "0001-accounts", ...accounts },
  { name: "0002-catalogue", ...catalogue },
  { name: "0003-community", ...community },
  { name: "0004-imports-and-lists", ...importsAndLists },
  { name: "0005-measured-list-lines", ...measuredListLines },
  { name: "0006-one-approved-cross", ...oneApprovedCross },
  { name: "0007-hashed-sessions", ...hashedSessions },
  { name: "0008-serials-words-and-orders", ...serialsWordsAndOrders },
  { name: "0009-near-number-index", ...nearNumberIndex },
  { name: "0010-proposals", ...proposals },
  { name: "0011-normalised", ...normalised },
  { name: "0012-packing-and-gaskets", ...packingAndGaskets },
  { name: "0013-small-parts", ...smallParts },
  { name: "0014-catalogue-version", ...catalogueVersion },
  { name: "0015-nearest-size-index", ...nearestSizeIndex },
  { name: "0016-catalogue-version-notice", ...catalogueVersionNotice },
  { name: "0017-number-variants", ...numberVariants },
  { name: "0018-part-sizes", ...partSizes },
  { name: "0019-variant-keys", ...variantKeys },
];
