package org.plenum.demo;

import java.math.BigDecimal;

/**
 * One item of the demo catalogue, as written to {@code items.csv}, plus the demand pattern the
 * simulation gives it.
 *
 * @param id           item id, {@code KG-0001} …
 * @param description  product name
 * @param group        product group
 * @param region       sales region
 * @param unitValue    value per unit in the company's currency, or {@code null} where the catalogue has none
 * @param channel      {@code retail}, {@code wholesale} or {@code online}
 * @param intermittent whether the item sells in only a few months (spare parts); forecast by SES
 */
record Item(String id, String description, ProductGroup group, String region, BigDecimal unitValue,
            String channel, boolean intermittent) {
}
